/**
 * WCAG 2.x contrast ratio between two sRGB colours given as #rrggbb: (L1 + 0.05) / (L2 + 0.05)
 * with L the relative luminance (WCAG 2.1, "relative luminance" and "contrast ratio" definitions).
 * Graphical objects need at least 3:1 against their background (WCAG 2.1 SC 1.4.11).
 * @throws Error for a colour that is not #rrggbb
 * @example contrastRatio("#000000", "#ffffff") // 21
 */
export function contrastRatio(a: string, b: string): number {
  const la = relativeLuminance(a);
  const lb = relativeLuminance(b);
  return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
}

/** Relative luminance of a #rrggbb colour (WCAG 2.1 definition, sRGB channel linearisation). */
export function relativeLuminance(hex: string): number {
  const match = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex);
  if (!match) throw new Error(`invalid colour ${JSON.stringify(hex)} (expected #rrggbb)`);
  const [r, g, b] = [match[1], match[2], match[3]].map((part) => {
    const c = parseInt(part as string, 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  }) as [number, number, number];
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}
