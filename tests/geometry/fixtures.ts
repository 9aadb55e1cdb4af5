// Invented studies for the tests (no real case, kit or rig).
import { type Study, type StudyInput, StudySchema } from "../../geometry/index";
import type { Wall } from "../../geometry/wall";

/** A wall as the core reports one, for the rules that read it (verdict, warnings): 2 mm required, reached, at the origin. */
export const reportedWall = (kind: Wall["kind"], minWallMm: number, ok: boolean, label: string = kind): Wall => ({
  kind,
  label,
  minWallMm,
  requiredMm: 2,
  reached: true,
  ok,
  atMm: [0, 0],
  cutPointMm: [0, 0],
});

const squareStuds = (half: number) => [
  { label: "a", positionMm: [-half, half] as [number, number] },
  { label: "b", positionMm: [half, half] as [number, number] },
  { label: "c", positionMm: [half, -half] as [number, number] },
  { label: "d", positionMm: [-half, -half] as [number, number] },
];

/** A round-mouth case with four studs on a 56 mm square and a kit whose skirt is wider than the mouth. */
export function roundStudyInput(): StudyInput {
  return {
    case: {
      name: "test case",
      deck: { kind: "circle", diameterMm: 110 },
      mouth: { outline: { kind: "circle", diameterMm: 46 }, depthMm: 26 },
      studs: squareStuds(28),
      studHoleDiameterMm: 7.5,
      stockBoreMm: 40,
      strokeMm: 39.2,
    },
    kits: [
      {
        id: "k1",
        name: "test kit",
        boreMm: 47,
        skirtDiameterReadingsMm: [53.9, 54],
        skirtLengthReadingsMm: [24.7],
        studs: squareStuds(28),
      },
    ],
  };
}

/** A polygon case (octagonal deck, non-round mouth) with four pockets. */
export function polygonStudyInput(): StudyInput {
  const s = roundStudyInput();
  return {
    ...s,
    case: {
      ...s.case,
      deck: { kind: "polygon", pointsMm: [[-40, -48], [40, -48], [48, -40], [48, 40], [40, 48], [-40, 48], [-48, 40], [-48, -40]] },
      mouth: { outline: { kind: "polygon", pointsMm: [[-23, -20], [23, -20], [25, 0], [23, 20], [-23, 20], [-25, 0]] }, depthMm: 26 },
      pockets: [
        { label: "left", outline: { kind: "polygon", pointsMm: [[-36, -8], [-31, -8], [-31, 8], [-36, 8]] } },
        { label: "right", outline: { kind: "polygon", pointsMm: [[31, -8], [36, -8], [36, 8], [31, 8]] } },
        { label: "front", outline: { kind: "polygon", pointsMm: [[-8, 31], [8, 31], [8, 36], [-8, 36]] } },
        { label: "rear", outline: { kind: "polygon", pointsMm: [[-8, -36], [8, -36], [8, -31], [-8, -31]] } },
      ],
    },
  };
}

/** A rig whose calibrated bit reaches 52.5–62 mm. */
export const testRig = {
  name: "test rig",
  headDiameterMm: 34.5,
  bitLengthMm: 35,
  calibration: { bitLengthMm: 35, minCutDiameterMm: 52.5, maxCutDiameterMm: 62 },
  hardwareRadiusMm: 21,
  grooves: [
    { label: "g1", travelMm: 22 },
    { label: "g2", travelMm: 26 },
  ],
  shims: [
    { thicknessMm: 0.1, count: 5 },
    { thicknessMm: 0.5, count: 4 },
  ],
  drillTopRpm: 2800,
};

export function parse(input: StudyInput): Study {
  return StudySchema.parse(input);
}

type P = [number, number];

/** Four studs on a square of half-side `half` centred at `center` (not necessarily the cylinder axis). */
export function squarePattern(half: number, center: P = [0, 0]) {
  return squareStuds(half).map((s) => ({ ...s, positionMm: [s.positionMm[0] + center[0], s.positionMm[1] + center[1]] as P }));
}

/** The round study with the case's studs (and the kit's, which match them) centred at `center` instead of the cylinder axis. */
export function offCentreStudyInput(center: P): StudyInput {
  const s = roundStudyInput();
  return { ...s, case: { ...s.case, studs: squarePattern(28, center) }, kits: s.kits.map((k) => ({ ...k, studs: squarePattern(28, center) })) };
}

/** Holder-height readings at the given studs lying exactly on the plane h = a·x + b·y + c. */
export function planeReadings(studs: readonly { label: string; positionMm: readonly number[] }[], a: number, b: number, c: number) {
  return { holderHeights: studs.map((s) => ({ stud: s.label, heightMm: a * s.positionMm[0] + b * s.positionMm[1] + c })) };
}
