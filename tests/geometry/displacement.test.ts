// Swept volume V = (π/4)·B²·S·n (howmotorcycleswork.com, "engine mathematics"), and the legal classes a change
// of bore crosses. A class "up to 50 cc" holds 50 cc itself (Regulation (EU) No 168/2013, Annex I, category
// L1e-B: "≤ 50 cm³", from memory).
import { describe, expect, it } from "vitest";
import { displacementCc, thresholdsCrossedCc } from "../../geometry/displacement";

describe("displacement", () => {
  it("one cylinder unless told otherwise: a 100 × 83 mm single is 651.88 cc, a twin of it 1303.76 cc", () => {
    expect(displacementCc(100, 83)).toBeCloseTo(651.88, 2);
    expect(displacementCc(100, 83, 2)).toBeCloseTo(1303.76, 2);
  });

  it("a 40 mm bore over a 39.2 stroke is 49.26 cc and a 47 mm bore 68.01 cc: the 50 cc class is crossed", () => {
    const from = displacementCc(40, 39.2);
    const to = displacementCc(47, 39.2);
    expect(from).toBeCloseTo(49.26, 2);
    expect(to).toBeCloseTo(68.01, 2);
    expect(thresholdsCrossedCc(from, to, [50, 125])).toEqual([50]);
  });

  it("a class is crossed either way, and 50 cc itself is inside the 50 cc class", () => {
    expect(thresholdsCrossedCc(51, 49, [50])).toEqual([50]);
    expect(thresholdsCrossedCc(50, 51, [50])).toEqual([50]);
    expect(thresholdsCrossedCc(49, 50, [50])).toEqual([]);
    expect(thresholdsCrossedCc(51, 60, [50])).toEqual([]);
    expect(thresholdsCrossedCc(40, 130, [50, 125])).toEqual([50, 125]);
    expect(thresholdsCrossedCc(100, 130, [50, 125])).toEqual([125]);
  });
});
