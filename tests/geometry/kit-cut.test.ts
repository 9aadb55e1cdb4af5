// The planned cut of one kit: which parts of it the core proposed, and the walls and largest cut of a holder
// tilted so the cut's bottom sits off its deck centre. The fixture is the invented round study (studs on a 56 mm
// square, Ø7.5 mm holes, Ø110 mm deck on the axis, 2 mm land and wall minimums: common practice, no published
// source). The tool axis at depth z is P + (h₀ + z)·(a, b), h₀ the holder's height at the bearing P
// (geometry/alignment.ts); every expected figure is worked by hand from that beside the check.
import { describe, expect, it } from "vitest";
import { evaluateStudy, type StudyInput } from "../../geometry/index";
import { parse, planeReadings, roundStudyInput, testRig } from "./fixtures";

const leftPocket = { label: "left", outline: { kind: "polygon" as const, pointsMm: [[-36, -8], [-31, -8], [-31, 8], [-36, 8]] as [number, number][] } };

/** The round study with a cut given and the holder on the plane h = a·x + b·y + 2 (h₀ = 2 mm at the bearing on the axis). */
function tilted(a: number, b: number, cut: StudyInput["cut"], pockets: (typeof leftPocket)[] = []): StudyInput {
  const s = roundStudyInput();
  return { ...s, case: { ...s.case, pockets }, cut, readings: planeReadings(s.case.studs, a, b, 2) };
}

describe("which parts of the cut the core proposed", () => {
  it("none given: both proposed", () => {
    const cut = evaluateStudy(parse(roundStudyInput())).kits[0].cut!;
    expect(cut).toMatchObject({ proposed: true, diameterProposed: true, depthProposed: true });
  });

  it("only the diameter given: the depth proposed", () => {
    const cut = evaluateStudy(parse({ ...roundStudyInput(), cut: { diameterMm: 56 } })).kits[0].cut!;
    expect(cut).toMatchObject({ diameterMm: 56, proposed: true, diameterProposed: false, depthProposed: true });
  });

  it("only the depth given: the diameter proposed", () => {
    const cut = evaluateStudy(parse({ ...roundStudyInput(), cut: { depthMm: 25.5 } })).kits[0].cut!;
    expect(cut).toMatchObject({ depthMm: 25.5, proposed: true, diameterProposed: true, depthProposed: false });
  });

  it("both given: nothing proposed", () => {
    const cut = evaluateStudy(parse({ ...roundStudyInput(), cut: { diameterMm: 56, depthMm: 25.5 } })).kits[0].cut!;
    expect(cut).toMatchObject({ diameterMm: 56, depthMm: 25.5, proposed: false, diameterProposed: false, depthProposed: false });
  });
});

describe("a tilted holder: the cut's bottom counts where it comes nearer a feature", () => {
  // a = 0.04, cut 25 mm deep: the deck centre sits 2·0.04 = 0.08 mm toward +x, the bottom's (2 + 25)·0.04 = 1.08.
  it("the largest cut is set by the studs the bottom comes nearer", () => {
    const k = evaluateStudy(parse(tilted(0.04, 0, { diameterMm: 57, depthMm: 25 }))).kits[0];
    expect(k.cut?.centerAtDeckMm[0]).toBeCloseTo(0.08, 12);
    expect(k.cut?.centerAtBottomMm[0]).toBeCloseTo(1.08, 12);
    // Studs b, c at (28, ±28) from (1.08, 0): √(26.92² + 28²) − 3.75 hole − 2 land; from the deck's centre
    // they lie at √(27.92² + 28²), and the deck outline and studs a, d further still.
    expect(k.maxCutDiameterMm).toBeCloseTo(2 * (Math.hypot(26.92, 28) - 5.75), 9);
  });

  it("and by a pocket the deck centre is nearer, though the bottom draws away from it", () => {
    // The left pocket's edge x = −31: 31.08 − 2 wall at the deck, 32.08 − 2 at the bottom; the studs allow 33.1.
    const k = evaluateStudy(parse(tilted(0.04, 0, { diameterMm: 57, depthMm: 25 }, [leftPocket]))).kits[0];
    expect(k.maxCutDiameterMm).toBeCloseTo(2 * (31.08 - 2), 9);
  });

  it("a wall as thin at the bottom as at the deck is shown at the deck", () => {
    // b = 0.04: the centres sit 0.08 (deck) and 1.08 mm (bottom) toward +y; the pocket's straight edge x = −31
    // lies 31 mm from both, nearest at (−31, 0.08) from the deck's centre and (−31, 1.08) from the bottom's.
    const k = evaluateStudy(parse(tilted(0, 0.04, { diameterMm: 57, depthMm: 25 }, [leftPocket]))).kits[0];
    expect(k.cut?.centerAtBottomMm[1]).toBeCloseTo(1.08, 12);
    const wall = k.walls.find((w) => w.label === "left")!;
    expect(wall.minWallMm).toBeCloseTo(31 - 28.5, 9);
    expect(wall.atMm[0]).toBeCloseTo(-31, 9);
    expect(wall.atMm[1]).toBeCloseTo(0.08, 9);
    expect(wall.cutPointMm[0]).toBeCloseTo(-28.5, 9);
    expect(wall.cutPointMm[1]).toBeCloseTo(0.08, 9);
  });
});

describe("a diameter proposed for a rig", () => {
  // The setting s = (D + D_head)/2 is dialled on a caliper (tests/geometry/sources.test.ts, common practice, no
  // published source), so the proposed D is the smallest 2·s − D_head ≥ D needed with s on the caliper's steps.
  // A Ø54.03 skirt with the default 0.5 mm clearance needs Ø55.03.
  const withRig = (settingResolutionMm?: number) => {
    const s = roundStudyInput();
    s.kits[0].skirtDiameterReadingsMm = [54.03];
    return evaluateStudy(parse({ ...s, rig: { ...testRig, ...(settingResolutionMm === undefined ? {} : { settingResolutionMm }) } })).kits[0].cut!;
  };

  it("a caliper read to 0.02 mm: s = 44.765 rounds up to 44.78, so D = 2·44.78 − 34.5 = 55.06 mm", () => {
    expect(withRig(0.02).diameterMm).toBeCloseTo(55.06, 9);
  });

  it("with no resolution given, a caliper read to 0.05 mm: s rounds up to 44.8, so D = 55.1 mm", () => {
    expect(withRig().diameterMm).toBeCloseTo(55.1, 9);
  });
});
