import { diff, mergeDiff } from "../kernel/patch";
import { studyFromObject, type LoadResult } from "./load-study";
import { defaultRiskSettings } from "../risk/default-risk-settings";
import type { Study } from "./study";

/** The study without its risk settings when they are the ones its own tables imply (the usual case). */
function withoutDerivedRisk(study: Study): Partial<Study> {
  const { risk, ...rest } = study;
  return JSON.stringify(risk) === JSON.stringify(defaultRiskSettings(rest)) ? rest : study;
}

/**
 * Encodes a study in a URL fragment: the difference from the default study, as JSON, in
 * base64url (UTF-8). A link therefore stays short while the study is close to the defaults; risk
 * settings that are the defaults for the study's own tables are left out and rebuilt on opening.
 */
export function encodeStudyLink(study: Study, defaults: Study): string {
  const { risk: _risk, ...base } = defaults;
  const patch = diff(base, withoutDerivedRisk(study)) ?? {};
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
  const { risk: _risk, ...base } = defaults;
  const merged = mergeDiff({ ...base, schemaVersion: payload.v }, payload.d);
  return studyFromObject(merged);
}
