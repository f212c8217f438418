import type { SchemeId } from "../schemes/types";
import { SCHEMES } from "../schemes";

/** One colour per scheme, the same on every page and export: each scheme declares its own (colour-blind-safe set, Okabe–Ito). */
export const SCHEME_COLOURS: Readonly<Record<SchemeId, string>> = Object.fromEntries(SCHEMES.map((m) => [m.id, m.colour])) as Record<SchemeId, string>;
