import { describe, it, expect } from "vitest";
import { contrastRatio, relativeLuminance } from "../../../src/charts/contrast";
import { MATERIAL_COLOURS, MODULE_PALETTE, SCHEME_COLOURS, MATERIAL_KIND_COLOURS, materialColour, OTHER_MATERIAL_COLOUR } from "../../../src/charts/palette";
import { PART_COLOURS } from "../../../src/charts/part-colours";
import { MATERIALS } from "../../../src/materials";
import { expectRelClose } from "../../helpers/close";

describe("contrastRatio (WCAG 2.1 definition)", () => {
  it("black on white is 21:1 and a colour against itself is 1:1", () => {
    // WCAG 2.1, "contrast ratio": (1 + 0.05) / (0 + 0.05) = 21.
    expect(contrastRatio("#000000", "#ffffff")).toBe(21);
    expect(contrastRatio("#1d4e89", "#1d4e89")).toBe(1);
  });
  it("mid grey #777777 against white is about 4.48:1", () => {
    // By hand: c = 119/255 = 0.4667 → ((0.4667 + 0.055)/1.055)^2.4 = 0.1845; (1.05)/(0.2345) = 4.478.
    expectRelClose(relativeLuminance("#777777"), 0.18447, 1e-3);
    expectRelClose(contrastRatio("#777777", "#ffffff"), 4.478, 1e-3);
  });
  it("refuses a colour that is not #rrggbb", () => {
    expect(() => contrastRatio("red", "#ffffff")).toThrow(/invalid colour "red" \(expected #rrggbb\)/);
  });
});

describe("palettes", () => {
  const materials = Object.entries(MATERIAL_COLOURS);
  const all = [...materials.map(([id, c]) => [`material ${id}`, c]), ...MODULE_PALETTE.map((m) => [`module ${m.code}`, m.colour]), ...PART_COLOURS.map((c, i) => [`part ${i}`, c]), ["other material", OTHER_MATERIAL_COLOUR]];
  it.each(all)("%s (%s) reaches 3:1 against white", (_name, colour) => {
    expect(contrastRatio(colour as string, "#ffffff")).toBeGreaterThanOrEqual(3);
  });
  it("every bundled material has its own colour, and none is a scheme colour", () => {
    expect(Object.keys(MATERIAL_COLOURS).sort()).toEqual(MATERIALS.map((m) => m.id).sort());
    const colours = materials.map(([, c]) => c.toLowerCase());
    expect(new Set(colours).size).toBe(colours.length);
    const schemes = new Set(Object.values(SCHEME_COLOURS).map((c) => c.toLowerCase()));
    for (const c of [...colours, ...Object.values(MATERIAL_KIND_COLOURS).map((k) => k.toLowerCase())]) expect(schemes.has(c)).toBe(false);
  });
  it("module and part colours are distinct within their palette", () => {
    expect(new Set(MODULE_PALETTE.map((m) => m.colour)).size).toBe(MODULE_PALETTE.length);
    expect(new Set(PART_COLOURS).size).toBe(PART_COLOURS.length);
  });
  it("a material a page added takes the fallback colour", () => {
    expect(materialColour("my-new-epd")).toBe(OTHER_MATERIAL_COLOUR);
    expect(materialColour("glulam")).toBe(MATERIAL_COLOURS.glulam);
  });
});
