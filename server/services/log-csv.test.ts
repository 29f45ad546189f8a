import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { isoCell, numberCell } from "./log-csv";

const pad = (n: number, w: number) => String(n).padStart(w, "0");

describe("isoCell", () => {
  it("reads every well-formed logger timestamp as Date.parse reads its canonical ISO form", () => {
    fc.assert(
      fc.property(
        fc.date({ min: new Date("0100-01-01T00:00:00Z"), max: new Date("9999-12-31T23:59:59Z"), noInvalidDate: true }),
        fc.constantFrom("T", " "),
        fc.constantFrom("", ".", ","),
        fc.integer({ min: 1, max: 9 }),
        fc.constantFrom("", "Z", "+02:00", "-05:30", "+0100", "-1245"),
        (date, sep, mark, digits, zone) => {
          const d = date;
          const frac = mark ? `${mark}${pad(d.getUTCMilliseconds(), 3)}${"7".repeat(Math.max(0, digits - 3))}`.slice(0, 1 + digits) : "";
          const base = `${pad(d.getUTCFullYear(), 4)}-${pad(d.getUTCMonth() + 1, 2)}-${pad(d.getUTCDate(), 2)}`;
          const time = `${pad(d.getUTCHours(), 2)}:${pad(d.getUTCMinutes(), 2)}:${pad(d.getUTCSeconds(), 2)}`;
          const cell = `${base}${sep}${time}${frac}${zone}`;
          const canonicalZone = zone === "" ? "Z" : zone.length === 5 ? `${zone.slice(0, 3)}:${zone.slice(3)}` : zone;
          expect(isoCell(cell)).toBe(Date.parse(`${base}T${time}${frac.replace(",", ".")}${canonicalZone}`));
        },
      ),
      { numRuns: 2000 },
    );
  });

  it("refuses what is not an ISO 8601 date and time, and reads the odd forms Date.parse takes", () => {
    for (const bad of ["", "2026-11-02", "2026-13-01T00:00:00Z", "2026-11-02T08:60:00Z", "2026-11-02T08:00:00.Z", "2026-11-02T08:00:00+2:00", "2026-11-02T08:00:00+24:00", "2026-11-02T08:00:00Zx", "02/11/2026 08:00", "1793606400"]) {
      expect(isoCell(bad), bad).toBeNaN();
    }
    // Minutes only, 24:00 and a day past the month's end go the general way, as before.
    expect(isoCell("2026-11-02T08:00")).toBe(Date.parse("2026-11-02T08:00Z"));
    expect(isoCell("2026-11-02T24:00:00Z")).toBe(Date.parse("2026-11-03T00:00:00Z"));
    expect(isoCell("0050-01-01T00:00:00Z")).toBe(Date.parse("0050-01-01T00:00:00Z"));
  });
});

describe("numberCell", () => {
  it("reads decimal numbers, and a decimal comma only when commas do not separate cells", () => {
    expect(numberCell("-1.5e3", ",")).toBe(-1500);
    expect(numberCell("149,25", ";")).toBe(149.25);
    expect(numberCell("149,25", ",")).toBeNaN();
    for (const bad of ["", "0x10", "Infinity", "1 000", "n/a", "1.2.3"]) expect(numberCell(bad, ","), bad).toBeNaN();
  });
});
