import { diff, mergeDiff } from "../kernel/patch";
import { canonicalJson } from "../kernel/memo";
import { studyFromObject, type LoadResult } from "./load-study";
import { defaultRiskSettings } from "../risk/default-risk-settings";
import type { Study } from "./study";

// A study in a URL fragment (issue 14, "short links"). Format 2: the difference from the default
// study with arrays compared element by element (one edited factor row is one leaf, not the whole
// table), the risk settings as their difference from the defaults the study's own tables imply
// (an edit of a factor moves those defaults and used to put the whole risk table in the link),
// as JSON in base64url; `compressStudyLink` then deflates it ("deflate-raw", prefix "z").
// Format 1 links (the whole changed array, risk all or nothing, never compressed) still open.
// A link also carries a fingerprint of the defaults it was made against ("b"): a link records only
// what differs from them, so when they have changed since (a factor default set to its read value,
// say) the values it leaves to the defaults are today's, and the page says so.

const ARRAY_LENGTH = "#";

/** Arrays as objects keyed by index (with their length under "#"), so `diff` compares them element by element. */
function toTree(value: unknown): unknown {
  if (Array.isArray(value)) return Object.fromEntries([[ARRAY_LENGTH, value.length], ...value.map((x, i) => [String(i), toTree(x)])]);
  if (typeof value === "object" && value !== null) return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, toTree(v)]));
  return value;
}

/** The inverse of toTree; an element beyond the recorded length is dropped. */
function fromTree(value: unknown): unknown {
  if (typeof value !== "object" || value === null || Array.isArray(value)) return value;
  const record = value as Record<string, unknown>;
  if (typeof record[ARRAY_LENGTH] === "number") return Array.from({ length: record[ARRAY_LENGTH] }, (_, i) => fromTree(record[String(i)]));
  return Object.fromEntries(Object.entries(record).map(([k, v]) => [k, fromTree(v)]));
}

function toBase64Url(bytes: Uint8Array): string {
  let binary = "";
  for (const byte of bytes) binary += String.fromCharCode(byte);
  return btoa(binary).replace(/\+/g, "-").replace(/\//g, "_").replace(/=+$/, "");
}

function fromBase64Url(text: string): Uint8Array {
  return Uint8Array.from(atob(text.replace(/-/g, "+").replace(/_/g, "/")), (c) => c.charCodeAt(0));
}

/**
 * Encodes a study in a URL fragment (format 2, uncompressed): what differs from the default study,
 * element by element, and the risk settings as their difference from the study's own defaults.
 */
export function encodeStudyLink(study: Study, defaults: Study): string {
  const { risk, ...rest } = study;
  const { risk: _risk, ...base } = defaults;
  const d = diff(toTree(base), toTree(rest)) ?? {};
  const r = diff(toTree(defaultRiskSettings(rest)), toTree(risk));
  const payload = { v: study.schemaVersion, f: 2, b: defaultsFingerprint(defaults), d, ...(r === undefined ? {} : { r }) };
  return toBase64Url(new TextEncoder().encode(JSON.stringify(payload)));
}

/** A short fingerprint of the default study a link is made against (FNV-1a, 32 bits, of its canonical JSON, risk left out as links derive it), in hex. */
export function defaultsFingerprint(defaults: Study): string {
  const { risk: _risk, ...base } = defaults;
  let h = 0x811c9dc5;
  for (const ch of canonicalJson(base)) {
    h ^= ch.codePointAt(0)!;
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h.toString(16).padStart(8, "0");
}

/** A decoded link: the study, and whether it was made against other defaults than today's (then the values it leaves to them have changed). */
export type LinkResult = LoadResult & { otherDefaults?: boolean };

/** Decodes a fragment made by encodeStudyLink (either format, uncompressed); a broken or invalid link changes nothing and says why. */
export function decodeStudyLink(fragment: string, defaults: Study): LinkResult {
  const opened = decodedStudy(fragment, defaults);
  if (!opened.result.ok || opened.madeAgainst === undefined || opened.madeAgainst === defaultsFingerprint(defaults)) return opened.result;
  return { ...opened.result, otherDefaults: true };
}

/** The study in a link, and the fingerprint of the defaults it was made against (links before it was recorded have none). */
function decodedStudy(fragment: string, defaults: Study): { result: LoadResult; madeAgainst?: unknown } {
  let payload: { v?: unknown; f?: unknown; b?: unknown; d?: unknown; r?: unknown };
  try {
    payload = JSON.parse(new TextDecoder("utf-8", { fatal: true }).decode(fromBase64Url(fragment))) as typeof payload;
  } catch {
    return { result: { ok: false, problems: [{ path: "(link)", message: "the link is damaged (expected a study link made by spanbook)" }] } };
  }
  if (typeof payload !== "object" || payload === null) return { result: { ok: false, problems: [{ path: "(link)", message: "the link holds no study" }] } };
  const { risk: _risk, ...base } = defaults;
  if (payload.f !== 2) return { result: studyFromObject(mergeDiff({ ...base, schemaVersion: payload.v }, payload.d)) };
  const opened = studyFromObject(fromTree(mergeDiff(toTree({ ...base, schemaVersion: payload.v }), payload.d)));
  if (!opened.ok || payload.r === undefined) return { result: opened, madeAgainst: payload.b };
  const { risk: _derived, ...rest } = opened.study;
  return { result: studyFromObject({ ...opened.study, risk: fromTree(mergeDiff(toTree(defaultRiskSettings(rest)), payload.r)) }), madeAgainst: payload.b };
}

/** Prefix of a compressed fragment (an uncompressed one is base64url of "{", so it starts with "e"). */
const COMPRESSED = "z";

async function streamBytes(bytes: Uint8Array, stream: CompressionStream | DecompressionStream): Promise<Uint8Array> {
  const out = new Response(new Blob([bytes as BlobPart]).stream().pipeThrough(stream));
  return new Uint8Array(await out.arrayBuffer());
}

/** Deflates an encoded fragment ("deflate-raw", base64url, prefix "z"); keeps it as it is when that is not shorter. */
export async function compressStudyLink(fragment: string): Promise<string> {
  const packed = `${COMPRESSED}${toBase64Url(await streamBytes(fromBase64Url(fragment), new CompressionStream("deflate-raw")))}`;
  return packed.length < fragment.length ? packed : fragment;
}

/** The uncompressed fragment of a compressed one (others are returned as they are). @throws when a compressed fragment is damaged */
export async function inflateStudyLink(fragment: string): Promise<string> {
  if (!fragment.startsWith(COMPRESSED)) return fragment;
  return toBase64Url(await streamBytes(fromBase64Url(fragment.slice(COMPRESSED.length)), new DecompressionStream("deflate-raw")));
}
