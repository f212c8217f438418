import { geodesicCap, type GeodesicCap } from "./geodesic";

const CACHE_SIZE = 16;
const cache = new Map<string, GeodesicCap>();

/**
 * geodesicCap, remembering the last few caps made: the same geometry is asked for again whenever
 * only loads, factors or rates change (compare page, risk runs). The cap returned is shared: read only.
 */
export function cachedGeodesicCap(frequency: number, radiusM: number, capAngleRad: number): GeodesicCap {
  const key = `${frequency}|${radiusM}|${capAngleRad}`;
  let mesh = cache.get(key);
  if (!mesh) {
    mesh = geodesicCap(frequency, radiusM, capAngleRad);
    if (cache.size >= CACHE_SIZE) cache.delete(cache.keys().next().value as string);
    cache.set(key, mesh);
  }
  return mesh;
}
