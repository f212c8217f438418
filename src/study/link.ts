import { diff, mergeDiff } from "./patch";
import { studyFromObject, type LoadResult } from "./load-study";
import type { Study } from "./study";

/**
 * Encodes a study in a URL fragment: the difference from the default study, as JSON, in
 * base64url (UTF-8). A link therefore stays short while the study is close to the defaults.
 */
export function encodeStudyLink(study: Study, defaults: Study): string {
  const patch = diff(defaults, study) ?? {};
  const bytes = new TextEncoder().encode(JSON.stringify({ v: study.schemaVersion, d: patch }));
  let binary = "";
  for (const byte of bytes) binary += String.fromCharCode(byte);
  return btoa(binary).replace(/\+/g, "-").replace(/\//g, "_").replace(/=+$/, "");
}

/** Decodes a fragment made by encodeStudyLink; a broken or invalid link changes nothing and says why. */
export function decodeStudyLink(fragment: string, defaults: Study): LoadResult {
  let payload: { v?: unknown; d?: unknown };
  try {
    const binary = atob(fragment.replace(/-/g, "+").replace(/_/g, "/"));
    const bytes = Uint8Array.from(binary, (c) => c.charCodeAt(0));
    payload = JSON.parse(new TextDecoder("utf-8", { fatal: true }).decode(bytes)) as { v?: unknown; d?: unknown };
  } catch {
    return { ok: false, problems: [{ path: "(link)", message: "the link is damaged (expected a study link made by spanbook)" }] };
  }
  if (typeof payload !== "object" || payload === null) return { ok: false, problems: [{ path: "(link)", message: "the link holds no study" }] };
  const merged = mergeDiff({ ...defaults, schemaVersion: payload.v }, payload.d);
  return studyFromObject(merged);
}
