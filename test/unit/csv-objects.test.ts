// csvObjects replaces d3's csvParse (which compiles its row converter with Function(), refused by
// the site's Content-Security-Policy): it must give the same records and columns.
import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { csvParse, csvFormatRows } from "d3";
import { csvObjects } from "../../src/kernel/csv-table";

describe("csvObjects", () => {
  it("gives what d3's csvParse gives: quoted cells, short rows, blank lines, no rows", () => {
    for (const text of ["a,b\n1,2\n", "a,b\n\"x, y\",\"q\"\"q\"\n3\n\n", "a,b,c\n", "", "id,label\nsteel,Steel\r\nrebar,Rebar"]) {
      const ours = csvObjects(text);
      const theirs = csvParse(text);
      expect([...ours]).toEqual([...theirs]);
      expect(ours.columns).toEqual(theirs.columns);
    }
  });

  it("matches csvParse on any table of distinct column names", () => {
    const name = fc.string({ minLength: 1, maxLength: 6 }).filter((s) => s !== "__proto__");
    fc.assert(
      fc.property(fc.uniqueArray(name, { minLength: 1, maxLength: 5 }), fc.array(fc.array(fc.string({ maxLength: 6 }), { maxLength: 6 }), { maxLength: 6 }), (header, body) => {
        const text = csvFormatRows([header, ...body]);
        const ours = csvObjects(text);
        const theirs = csvParse(text);
        expect([...ours]).toEqual([...theirs]);
        expect(ours.columns).toEqual(theirs.columns);
      }),
    );
  });
});
