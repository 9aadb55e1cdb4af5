// The demo shop's invented library: case profiles, cylinder kits, boring rigs and studies. Every name and
// number here is invented for the demo. Idempotent: each row has a fixed id and is written only when missing.
import { eq, inArray } from "drizzle-orm";
import type { drizzle } from "drizzle-orm/libsql";
import type { z } from "zod";
import { CutPlanSchema, ReadingsSchema, StudyLimitsSchema } from "../geometry";
import { CaseDataSchema, KitDataSchema, RigDataSchema, type CaseDataInput, type KitDataInput, type RigDataInput } from "@/model/schemas";
import * as schema from "./schema";

type SeedDb = ReturnType<typeof drizzle<typeof schema>>;
type Person = { id: string; name: string };

const square = (half: number) => [
  { label: "front left", positionMm: [-half, half] as [number, number] },
  { label: "front right", positionMm: [half, half] as [number, number] },
  { label: "rear right", positionMm: [half, -half] as [number, number] },
  { label: "rear left", positionMm: [-half, -half] as [number, number] },
];

/** An eight-sided deck outline: a square of side 2·half with its corners cut back by `chamfer`. */
const octagon = (half: number, chamfer: number): [number, number][] => [
  [-half + chamfer, -half], [half - chamfer, -half], [half, -half + chamfer], [half, half - chamfer],
  [half - chamfer, half], [-half + chamfer, half], [-half, half - chamfer], [-half, -half + chamfer],
];

type CaseSeed = { id: string; name: string; notes: string; data: CaseDataInput; mouthReadingsMm: number[] };
type KitSeed = { id: string; name: string; notes: string; data: KitDataInput };
type RigSeed = { id: string; name: string; notes: string; data: RigDataInput };
type StudySeed = { id: string; name: string; notes: string; caseId: string; kitIds: string[]; rigId: string | null; cut?: z.input<typeof CutPlanSchema>; readings?: z.input<typeof ReadingsSchema>; limits?: z.input<typeof StudyLimitsSchema>; chosenKitId?: string };

export const DEMO_CASES: CaseSeed[] = [
  {
    id: "demo-case-marlet50",
    name: "Marlet 50 two-stroke case, round deck",
    notes: "Scooter case, early four-stud variant. Mouth read three times with calipers.",
    data: {
      deck: { kind: "circle", diameterMm: 98 },
      mouth: { outline: { kind: "circle", diameterMm: 46 }, depthMm: 26 },
      studs: square(28),
      studHoleDiameterMm: 7.5,
      studThread: "M7",
      stockBoreMm: 40,
      strokeMm: 39.2,
    },
    mouthReadingsMm: [46.04, 45.98, 46.02],
  },
  {
    id: "demo-case-corvane70",
    name: "Corvane 70 case, eight-sided deck with transfer pockets",
    notes: "Moped case with two transfer passages close to the mouth.",
    data: {
      deck: { kind: "polygon", pointsMm: octagon(48, 8) },
      mouth: { outline: { kind: "circle", diameterMm: 50 }, depthMm: 27 },
      studs: square(30),
      studHoleDiameterMm: 8.5,
      studThread: "M8",
      pockets: [
        { label: "left transfer", outline: { kind: "polygon", pointsMm: [[-38, -10], [-34, -9], [-33.5, 0], [-34, 9], [-38, 10]] } },
        { label: "right transfer", outline: { kind: "polygon", pointsMm: [[38, -10], [38, 10], [34, 9], [33.5, 0], [34, -9]] } },
      ],
      stockBoreMm: 45,
      strokeMm: 39.2,
    },
    mouthReadingsMm: [50.02, 50.06],
  },
  {
    id: "demo-case-tessup125",
    name: "Tessup 125 four-stroke case",
    notes: "Scooter four-stroke, 125–150 cc family. Cam-chain tunnel on the right of the mouth.",
    data: {
      deck: { kind: "polygon", pointsMm: [[-46, -50], [46, -50], [52, -44], [52, 44], [46, 50], [-46, 50], [-52, 44], [-52, -44]] },
      mouth: { outline: { kind: "circle", diameterMm: 60 }, depthMm: 30 },
      studs: square(32),
      studHoleDiameterMm: 8.5,
      studThread: "M8",
      pockets: [{ label: "cam-chain tunnel", outline: { kind: "polygon", pointsMm: [[36, -11], [46, -11], [46, 11], [36, 11]] } }],
      stockBoreMm: 52.4,
      strokeMm: 57.8,
    },
    mouthReadingsMm: [60.03, 60.0, 60.05],
  },
];

const kit = (id: string, name: string, boreMm: number, skirt: number[], length: number[], studs: ReturnType<typeof square>, thread: string, gaskets: number[], /** whole euros */ price: number, notes = ""): KitSeed => ({
  id,
  name,
  notes,
  data: { boreMm, skirtDiameterReadingsMm: skirt, skirtLengthReadingsMm: length, studs, studThread: thread, baseGasketsMm: gaskets, price: { amountMinor: price * 100, currency: "EUR" } },
});

export const DEMO_KITS: KitSeed[] = [
  kit("demo-kit-44", "Fernhollow 44 mm cast-iron kit", 44, [49.96, 49.98], [23.8, 23.9], square(28), "M7", [0.3, 0.5], 119),
  kit("demo-kit-47", "Fernhollow 47 mm five-port kit", 47, [53.92, 53.96, 53.94], [24.6, 24.7, 24.65], square(28), "M7", [0.2, 0.4], 289),
  kit("demo-kit-50", "Brackwater 50 mm long-skirt kit", 50, [57.4, 57.45], [26.4, 26.5], square(30), "M8", [0.3], 349, "Needs the eight-sided case's wider stud pattern."),
  kit("demo-kit-524", "Tessup 52.4 mm replacement kit", 52.4, [58.36, 58.4], [27.5, 27.6], square(32), "M8", [0.5, 0.8], 139),
  kit("demo-kit-54", "Orrin 54 mm kit", 54, [60.1, 60.14], [28.1, 28.2], square(32), "M8", [0.5], 189),
  kit("demo-kit-57", "Orrin 57 mm kit", 57, [63.18, 63.22, 63.2], [28.6, 28.7], square(32), "M8", [0.5, 0.8], 229),
  kit("demo-kit-585", "Kestrow 58.5 mm big-bore kit", 58.5, [64.8, 64.86], [29.0, 29.1], square(32), "M8", [0.5], 269),
  kit("demo-kit-61", "Kestrow 61 mm race kit", 61, [67.4, 67.46], [29.4, 29.5], square(33), "M8", [0.5], 339, "Wider stud pattern than the stock case."),
];

/** What sets a boring rig apart: its head, its bit (calibrated as fitted), the grooves' travels and the shims at hand as [thickness, how many]. */
type RigSpec = { headDiameterMm: number; bitLengthMm: number; cutDiameterMm: [min: number, max: number]; hardwareRadiusMm: number; travelsMm: number[]; shims: [number, number][]; drillTopRpm: number };

/** A demo rig: its grooves named "groove 1", "groove 2", … in order of travel; every setting read to 0.05 mm. */
const rig = (id: string, name: string, notes: string, r: RigSpec): RigSeed => ({
  id,
  name,
  notes,
  data: {
    headDiameterMm: r.headDiameterMm,
    bitLengthMm: r.bitLengthMm,
    calibration: { bitLengthMm: r.bitLengthMm, minCutDiameterMm: r.cutDiameterMm[0], maxCutDiameterMm: r.cutDiameterMm[1] },
    hardwareRadiusMm: r.hardwareRadiusMm,
    grooves: r.travelsMm.map((travelMm, i) => ({ label: `groove ${i + 1}`, travelMm })),
    shims: r.shims.map(([thicknessMm, count]) => ({ thicknessMm, count })),
    drillTopRpm: r.drillTopRpm,
    settingResolutionMm: 0.05,
  },
});

/** The bench rig with the short shaft: three grooves and three shim sizes, as a hobby builder has at hand. */
export const SHORT_SHAFT_RIG = rig(
  "demo-rig-short",
  "Bench rig, short shaft",
  "Holder plate on spacers; the 35 mm bit.",
  { headDiameterMm: 34.5, bitLengthMm: 35, cutDiameterMm: [52.5, 62], hardwareRadiusMm: 21, travelsMm: [22, 26, 30], shims: [[0.1, 5], [0.5, 4], [1, 4]], drillTopRpm: 2800 },
);

export const DEMO_RIGS: RigSeed[] = [
  SHORT_SHAFT_RIG,
  rig(
    "demo-rig-long",
    "Long-reach rig, big head",
    "For four-stroke cases; the 40 mm bit.",
    { headDiameterMm: 44, bitLengthMm: 40, cutDiameterMm: [60, 72], hardwareRadiusMm: 26, travelsMm: [26, 30, 34], shims: [[0.2, 5], [0.5, 4], [1, 3]], drillTopRpm: 2400 },
  ),
];

export const DEMO_STUDIES: StudySeed[] = [
  {
    id: "demo-study-marlet",
    name: "Marlet 50: 47 mm or stock-size upgrade",
    notes: "Customer wants more go without leaving the moped class question unanswered.",
    caseId: "demo-case-marlet50",
    kitIds: ["demo-kit-44", "demo-kit-47"],
    rigId: "demo-rig-short",
    readings: {
      holderHeights: [
        { stud: "front left", heightMm: 12.02 },
        { stud: "front right", heightMm: 12.05 },
        { stud: "rear right", heightMm: 12.04 },
        { stud: "rear left", heightMm: 12.01 },
      ],
    },
    chosenKitId: "demo-kit-47",
  },
  {
    id: "demo-study-corvane",
    name: "Corvane 70: which bore for the eight-sided case",
    notes: "",
    caseId: "demo-case-corvane70",
    kitIds: ["demo-kit-47", "demo-kit-50"],
    rigId: "demo-rig-short",
    limits: { minWallMm: 2.5 },
  },
  {
    id: "demo-study-tessup",
    name: "Tessup 125: five candidate bores",
    notes: "Shop's standard comparison for this case family; duplicate it per customer.",
    caseId: "demo-case-tessup125",
    kitIds: ["demo-kit-524", "demo-kit-54", "demo-kit-57", "demo-kit-585", "demo-kit-61"],
    rigId: "demo-rig-long",
  },
];

/** Readings as stored: each value with who took it and when. */
const stamped = (values: readonly number[], by: Person, at: number) => values.map((valueMm) => ({ valueMm, takenById: by.id, takenByName: by.name, takenAt: at }));

/** Inserts the demo library into the demo shop where it is missing; returns how many rows it wrote. */
export async function seedLibrary(db: SeedDb, shopId: string, owner: Person, builder: Person = owner): Promise<number> {
  let written = 0;
  const at = new Date(Date.UTC(2026, 0, 12, 9, 30));
  const ms = at.getTime();
  const common = { organizationId: shopId, version: 1, createdAt: at, updatedAt: at, createdBy: owner.id };
  await db.transaction(async (tx) => {
    const have = async (table: typeof schema.caseProfile | typeof schema.cylinderKit | typeof schema.boringRig | typeof schema.study, ids: string[]) =>
      new Set((await tx.select({ id: table.id }).from(table).where(inArray(table.id, ids))).map((r) => r.id));

    const cases = await have(schema.caseProfile, DEMO_CASES.map((c) => c.id));
    for (const c of DEMO_CASES.filter((x) => !cases.has(x.id))) {
      const data = CaseDataSchema.parse(c.data);
      await tx.insert(schema.caseProfile).values({ ...common, id: c.id, name: c.name, notes: c.notes, dataJson: JSON.stringify(data), mouthReadingsJson: JSON.stringify(stamped(c.mouthReadingsMm, builder, ms)) });
      written++;
    }
    const kits = await have(schema.cylinderKit, DEMO_KITS.map((k) => k.id));
    for (const k of DEMO_KITS.filter((x) => !kits.has(x.id))) {
      const data = KitDataSchema.parse(k.data);
      const readings = { skirtDiameter: stamped(data.skirtDiameterReadingsMm, builder, ms), skirtLength: stamped(data.skirtLengthReadingsMm, builder, ms) };
      await tx.insert(schema.cylinderKit).values({ ...common, id: k.id, name: k.name, notes: k.notes, dataJson: JSON.stringify(data), readingsJson: JSON.stringify(readings) });
      written++;
    }
    const rigs = await have(schema.boringRig, DEMO_RIGS.map((r) => r.id));
    for (const r of DEMO_RIGS.filter((x) => !rigs.has(x.id))) {
      await tx.insert(schema.boringRig).values({ ...common, id: r.id, name: r.name, notes: r.notes, dataJson: JSON.stringify(RigDataSchema.parse(r.data)) });
      written++;
    }
    const studies = await have(schema.study, DEMO_STUDIES.map((s) => s.id));
    for (const s of DEMO_STUDIES.filter((x) => !studies.has(x.id))) {
      await tx.insert(schema.study).values({
        ...common,
        id: s.id,
        name: s.name,
        notes: s.notes,
        caseId: s.caseId,
        rigId: s.rigId,
        cutJson: s.cut ? JSON.stringify(CutPlanSchema.parse(s.cut)) : null,
        readingsJson: s.readings ? JSON.stringify(ReadingsSchema.parse(s.readings)) : null,
        limitsJson: s.limits ? JSON.stringify(StudyLimitsSchema.parse(s.limits)) : null,
        chosenKitId: s.chosenKitId ?? null,
      });
      await tx.insert(schema.studyKit).values(s.kitIds.map((kitId, position) => ({ studyId: s.id, kitId, position })));
      await tx.insert(schema.studyEvent).values({ id: `${s.id}-created`, studyId: s.id, at, byId: owner.id, byName: owner.name, summary: "created the study" });
      written++;
    }
  });
  return written;
}

/** Whether the demo library is in place (for scripts that report on the seed). */
export async function hasDemoLibrary(db: SeedDb): Promise<boolean> {
  const found = await db.select({ id: schema.study.id }).from(schema.study).where(eq(schema.study.id, DEMO_STUDIES[0].id));
  return found.length > 0;
}
