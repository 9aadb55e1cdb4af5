// The library CSV's own cell formats (chosen to be typed by hand in a spreadsheet): each reads what it writes,
// and a cell in the wrong format is refused with how to write it.
import { describe, expect, it } from "vitest";
import { CellError, num, numList, outline, outlineText, pockets, pocketsText, studs, studsText, yesNo } from "@/db/csv/cells";

describe("CSV cells", () => {
  it("read numbers with a point for decimals and refuse a decimal comma with the reason", () => {
    expect(num(" 46.5 ")).toBe(46.5);
    expect(num("-.5")).toBe(-0.5);
    expect(num("1e2")).toBe(100);
    expect(() => num("46,5")).toThrow(/use a point for decimals/);
    expect(() => num("about 46")).toThrow(CellError);
  });

  it("read a list separated by semicolons, skipping empty entries", () => {
    expect(numList("53.92; 53.96;; 53.94 ;")).toEqual([53.92, 53.96, 53.94]);
    expect(numList("")).toEqual([]);
  });

  it("read a circle with or without its centre, and a polygon as points, and write them back the same", () => {
    expect(outline("circle 46")).toEqual({ kind: "circle", diameterMm: 46 });
    expect(outline("Circle 46 at 0.5 -0.2")).toEqual({ kind: "circle", diameterMm: 46, centerMm: [0.5, -0.2] });
    expect(outline("0 0, 10 0, 10 5")).toEqual({ kind: "polygon", pointsMm: [[0, 0], [10, 0], [10, 5]] });
    for (const text of ["circle 46", "circle 46 at 0.5 -0.2", "0 0, 10 0, 10 5"]) expect(outlineText(outline(text))).toBe(text);
    expect(() => outline("circle of 46")).toThrow(/write a circle as/);
    expect(() => outline("0 0, 10")).toThrow(/a point is two numbers/);
  });

  it("read studs as label and point, a colon in the label kept, and write them back the same", () => {
    const text = "front left: -35 35; rear: right: 35 -35";
    expect(studs(text)).toEqual([
      { label: "front left", positionMm: [-35, 35] },
      { label: "rear: right", positionMm: [35, -35] },
    ]);
    expect(studsText(studs(text))).toBe(text);
    expect(() => studs("35 35")).toThrow(/write each stud as/);
  });

  it("read pockets with the depth they start at (0 when not given), and write them back the same", () => {
    const text = "transfer: 20 -5, 30 -5, 30 5 | boost @3: circle 6 at 30 0";
    expect(pockets(text)).toEqual([
      { label: "transfer", startDepthMm: 0, outline: { kind: "polygon", pointsMm: [[20, -5], [30, -5], [30, 5]] } },
      { label: "boost", startDepthMm: 3, outline: { kind: "circle", diameterMm: 6, centerMm: [30, 0] } },
    ]);
    expect(pocketsText(pockets(text))).toBe(text);
    expect(() => pockets("no outline here")).toThrow(/write each pocket as/);
  });

  it("read yes and no in the usual spellings, and nothing else", () => {
    expect(["yes", "TRUE", "1", "y"].map(yesNo)).toEqual([true, true, true, true]);
    expect(["no", "False", "0", "n"].map(yesNo)).toEqual([false, false, false, false]);
    expect(() => yesNo("maybe")).toThrow(/write yes or no/);
  });
});
