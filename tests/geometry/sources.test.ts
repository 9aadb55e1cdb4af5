// Checks of the core against sources outside the project. Each check names its source beside it.
import { describe, expect, it } from "vitest";
import Matrix, { solve } from "ml-matrix";
import { DEFAULT_CASE_DENSITY_G_PER_CM3, DEFAULT_CUTTING_SPEED_MAX_M_PER_MIN, DEFAULT_CUTTING_SPEED_MIN_M_PER_MIN, DEFAULT_MIN_DEPTH_CLEARANCE_MM, LimitsSchema, evaluateStudy } from "../../geometry/index";
import { bitLengthWindowMm, bitReachMm, cutterSettingMm } from "../../geometry/rig";
import { depthClearance, skirtProtrusionMm } from "../../geometry/depth";
import { MM_PER_INCH, inToMm, toFractionalInches } from "../../geometry/units";
import { displacementCc, roundCc } from "../../geometry/displacement";
import { cuttingSpeedMPerMin, spindleRpm, spindleSpeed } from "../../geometry/speed";
import { removal } from "../../geometry/removal";
import { minorDiameterMm, parseMetricThread } from "../../geometry/threads";
import { lensArea } from "../../geometry/lens";
import { fitPlane } from "../../geometry/alignment";
import { parse, roundStudyInput } from "./fixtures";

describe("cutter setting", () => {
  it("a 34.5 mm head set for a 57 mm bore reads 45.75 mm across head and bit", () => {
    // Worked example from a practitioner (common practice, no published source).
    expect(cutterSettingMm(57, 34.5)).toBeCloseTo(45.75, 9);
  });
});

describe("bit reach", () => {
  // Common practice, no published source: a bit cut down to 35 mm reaches about 52.5–62 mm;
  // before it was cut down its smallest cut was 66.5 mm.
  const calibration = { bitLengthMm: 35, minCutDiameterMm: 52.5, maxCutDiameterMm: 62 };

  it("each millimetre off the bit moves both ends of its range down 2 mm, so the uncut bit was 42 mm long", () => {
    // The longest bit whose smallest cut is the 66.5 mm the uncut bit gave is the uncut bit's length.
    expect(bitLengthWindowMm(66.5, calibration).max).toBeCloseTo(42, 9);
    const before = bitReachMm(42, calibration);
    expect(before.min).toBeCloseTo(66.5, 9);
    expect(before.max).toBeCloseTo(76, 9);
    // One millimetre off moves both ends down 2 mm.
    expect(bitReachMm(41, calibration).min).toBeCloseTo(64.5, 9);
    expect(bitReachMm(41, calibration).max).toBeCloseTo(74, 9);
  });

  it("the 35 mm bit is inside the window of lengths that reach a 57 mm cut, and the 42 mm bit is not", () => {
    const w = bitLengthWindowMm(57, calibration);
    expect(w.min).toBeLessThanOrEqual(35);
    expect(w.max).toBeGreaterThanOrEqual(35);
    expect(w.max).toBeLessThan(42);
  });
});

describe("depth clearance", () => {
  // Common practice, no published source: skirt-length readings whose largest is 24.7 mm, run with no base
  // gasket; a 25 mm counterbore was judged too tight by the builder; about 0.5 mm more was accepted.
  const kit = { skirtLengthReadingsMm: [24.55, 24.7, 24.62], baseGasketsMm: [0.3], alwaysWithGasket: false };
  const protrusion = skirtProtrusionMm(kit).protrusionMm;

  it("with no gasket the protrusion is the longest reading", () => {
    expect(protrusion).toBeCloseTo(24.7, 9);
  });

  it("a 25 mm counterbore falls below the default minimum depth clearance and 25.5 mm meets it", () => {
    const tight = depthClearance(25, 0, protrusion, 40, 1e-9).depthClearanceMm;
    const accepted = depthClearance(25.5, 0, protrusion, 40, 1e-9).depthClearanceMm;
    expect(tight).not.toBeNull();
    expect(accepted).not.toBeNull();
    expect(tight ?? NaN).toBeLessThan(DEFAULT_MIN_DEPTH_CLEARANCE_MM);
    expect(accepted ?? NaN).toBeGreaterThanOrEqual(DEFAULT_MIN_DEPTH_CLEARANCE_MM);
  });
});

describe("inches", () => {
  it("13/16 in is exactly 20.6375 mm, the washer bore that fits a 20 mm shaft", () => {
    // 1 in = 25.4 mm exactly (NBS Circular 572 Addendum, 1959 international yard and pound agreement).
    // A 20 mm shaft takes washers of about 20 mm or 13/16" bore (common practice).
    expect(MM_PER_INCH).toBe(25.4);
    expect(inToMm(13 / 16)).toBe(20.6375);
    const f = toFractionalInches(20.6375 / 25.4, 64);
    expect([f.whole, f.numerator, f.denominator]).toEqual([0, 13, 16]);
    expect(inToMm(13 / 16)).toBeGreaterThan(20);
  });
});

describe("displacement", () => {
  // howmotorcycleswork.com, "engine mathematics"; rounding to the nearest whole cc as in US 40 CFR 86.419-78.
  it("a 100 × 83 mm single is 651.88 cc", () => {
    expect(displacementCc(100, 83, 1)).toBeCloseTo(651.88, 2);
    expect(roundCc(displacementCc(100, 83, 1))).toBe(652);
  });
  it("a 65.5 × 44.5 mm four is 599.78 cc", () => {
    expect(displacementCc(65.5, 44.5, 4)).toBeCloseTo(599.78, 2);
    expect(roundCc(displacementCc(65.5, 44.5, 4))).toBe(600);
  });
});

describe("spindle speed", () => {
  it("Ø150 mm at 250 min⁻¹ is 117.8 m/min, and 117.8 m/min at Ø150 mm is 250 min⁻¹", () => {
    // Tungaloy technical data, turning formulas: the worked example Vc = π·150·250/1000 ≈ 117.8 m/min.
    expect(cuttingSpeedMPerMin(150, 250)).toBeCloseTo(117.8, 1);
    // The source's rounded figure fed the other way: 1000·117.8/(π·150) = 249.97 min⁻¹.
    expect(spindleRpm(117.8, 150)).toBeCloseTo(250, 0);
    expect(spindleRpm(117.8, 150)).toBeLessThan(250);
  });
  it("the spindle window the rig set-up gives a Ø57 mm cut lies inside the speeds the cited ranges give at that diameter", () => {
    // Carvill, Mechanical Engineer's Data Handbook §5.6.7: aluminium with carbide 90–150 m/min rough (from memory);
    // Kyocera turning data: 100–200 m/min (from memory). n = 1000·Vc/(π·D) (Tungaloy technical data).
    const n = (vc: number) => (1000 * vc) / (Math.PI * 57);
    const s = spindleSpeed(57, DEFAULT_CUTTING_SPEED_MIN_M_PER_MIN, DEFAULT_CUTTING_SPEED_MAX_M_PER_MIN, 10_000);
    expect(s.min).toBeGreaterThanOrEqual(Math.max(n(90), n(100)) - 1e-9);
    expect(s.max).toBeLessThanOrEqual(Math.min(n(150), n(200)) + 1e-9);
    expect(s.min).toBeLessThan(s.max);
  });
});

describe("ISO metric threads", () => {
  // Coarse pitches from ISO 262:1998, Table 1 (M7 → 1, M8 → 1.25). Minor diameter of the internal thread
  // D1 = D − 1.082532·P (ISO 724:1993, basic dimensions); the figures 5.917 and 6.647 mm as listed in a tap
  // maker's published thread-limits table for M7×1 and M8×1.25 (from memory; no maker named).
  it("M7 takes the coarse pitch 1.0 when none is given", () => {
    const t = parseMetricThread("M7");
    expect(t.pitchMm).toBe(1);
    expect(t.pitchImplied).toBe(true);
  });
  it("M8 takes the coarse pitch 1.25 and an explicit fine pitch 1.0 is kept", () => {
    expect(parseMetricThread("M8").pitchMm).toBe(1.25);
    expect(parseMetricThread("M8x1").pitchMm).toBe(1);
    expect(parseMetricThread("M8x1").pitchImplied).toBe(false);
  });
  it("minor diameters are 5.917 mm for M7×1 and 6.647 mm for M8×1.25", () => {
    expect(minorDiameterMm(parseMetricThread("M7x1"))).toBeCloseTo(5.917, 3);
    expect(minorDiameterMm(parseMetricThread("M8"))).toBeCloseTo(6.647, 3);
  });
});

describe("circle–circle lens", () => {
  it("two unit circles one apart overlap by 1.22837", () => {
    // Wolfram MathWorld, "Circle-Circle Intersection"; also published in the CRAN vennDiagramLab manual.
    expect(lensArea(1, 1, 1)).toBeCloseTo(1.22837, 5);
  });
});

describe("plane fit", () => {
  // Points (0,0,1), (1,0,2), (0,1,3), (1,1,5) → a = 1.5, b = 2.5, c = 0.75 with residuals ±0.25: a worked
  // least-squares plane-fit example, worked by hand from the normal equations (from memory, no published page
  // named); cross-checked below against ml-matrix's QR solve.
  const pts = [
    { atMm: [0, 0] as const, heightMm: 1 },
    { atMm: [1, 0] as const, heightMm: 2 },
    { atMm: [0, 1] as const, heightMm: 3 },
    { atMm: [1, 1] as const, heightMm: 5 },
  ];
  it("fits a = 1.5, b = 2.5, c = 0.75", () => {
    const f = fitPlane(pts);
    expect(f.a).toBeCloseTo(1.5, 12);
    expect(f.b).toBeCloseTo(2.5, 12);
    expect(f.cMm).toBeCloseTo(0.75, 12);
    expect(f.rockMm).toBeCloseTo(0.25, 12);
  });
  it("agrees with ml-matrix's least-squares solve", () => {
    // ml-matrix, a general-purpose linear-algebra library, solves the over-determined system by QR.
    const A = new Matrix(pts.map((p) => [p.atMm[0], p.atMm[1], 1]));
    const h = Matrix.columnVector(pts.map((p) => p.heightMm));
    const x = solve(A, h, true);
    const f = fitPlane(pts);
    expect(f.a).toBeCloseTo(x.get(0, 0), 10);
    expect(f.b).toBeCloseTo(x.get(1, 0), 10);
    expect(f.cMm).toBeCloseTo(x.get(2, 0), 10);
  });
});

describe("case alloy density", () => {
  it("a case with no density given weighs its removed aluminium at A356.0-T6's 2.67 g/cm³", () => {
    // MatWeb: A356.0-T6 2.67 g/cm³. NADCA table A-3-2: die-casting alloy 383 2.74 g/cm³.
    const r = removal([0, 0], 28, 25, { kind: "circle", diameterMm: 46 }, 26, DEFAULT_CASE_DENSITY_G_PER_CM3, 1e-9);
    const volumeMm3 = Math.PI * (28 * 28 - 23 * 23) * 25;
    expect(r.massG).toBeCloseTo((volumeMm3 / 1000) * 2.67, 6);
    // Within 0.1 g/cm³ of the die-casting alloy, so the mass is within 4 % of the 383 figure.
    expect(Math.abs(r.massG / ((volumeMm3 / 1000) * 2.74) - 1)).toBeLessThan(0.04);
  });
});

describe("limits with no published source", () => {
  it("minimum radial clearance, depth clearance, sealing land and wall are shop defaults of 0.5, 0.5, 2 and 2 mm", () => {
    // No published source gives a minimum radial clearance for a skirt in a case mouth or a minimum sealing
    // land: these defaults are common practice, no published source, the shop's to set, and shown as defaults.
    const filled = LimitsSchema.parse({});
    expect([filled.minRadialClearanceMm, filled.minDepthClearanceMm, filled.minSealingLandMm, filled.minWallMm]).toEqual([0.5, 0.5, 2, 2]);
    expect(LimitsSchema.parse({ minWallMm: 3 }).minWallMm).toBe(3);
    // And a study that gives none is held to them: 28√2 − 3.75 − R of land round each stud of a 56 mm square.
    const landAt = (landMm: number) => {
      const diameterMm = 2 * (28 * Math.SQRT2 - 3.75 - landMm);
      const k = evaluateStudy(parse({ ...roundStudyInput(), cut: { diameterMm, depthMm: 25.5 } })).kits[0];
      return k.walls.filter((w) => w.kind === "stud").every((w) => w.ok);
    };
    expect(landAt(1.95)).toBe(false);
    expect(landAt(2.05)).toBe(true);
  });
});
