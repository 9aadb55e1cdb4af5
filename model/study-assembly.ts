// One assembler: a study's rows (its case, its kits in order, its rig) and its own fields become the core's
// Study. The server (results, export, the study page), the browser (the live studio) and the export all
// call it, so the same rows give the same Study everywhere. Pure: no I/O.
import { StudySchema, type Study, type StudyInput } from "@/geometry";
import type { z } from "zod";

type CaseInput = StudyInput["case"];
type KitInput = StudyInput["kits"][number];
type RigInput = NonNullable<StudyInput["rig"]>;

/** What the assembler reads of a case row: its name, its data and the mouth readings taken on it. */
export type CaseRowPart = { name: string; data: Omit<CaseInput, "name">; mouthReadingsMm?: readonly { valueMm: number }[] };
/** What the assembler reads of a kit row (its price is money the core never reads, so it stays behind). */
export type KitRowPart = { id: string; name: string; data: Omit<KitInput, "id" | "name" | "price"> & { price?: unknown } };
/** What the assembler reads of a rig row. */
export type RigRowPart = { name: string; data: Omit<RigInput, "name"> };

/** A study's rows and its own fields, as stored or as being edited. */
export type StudyRows = {
  name: string;
  /** The case row, or null when it is missing (the study is then incomplete). */
  case: CaseRowPart | null;
  /** The kit rows in the study's order; a row that no longer exists is simply left out. */
  kits: readonly KitRowPart[];
  rig: RigRowPart | null;
  cut?: StudyInput["cut"] | null;
  readings?: StudyInput["readings"] | null;
  limits?: StudyInput["limits"] | null;
};

/** The study as the core reads it, before the core's schema checks it; `case` is absent when the case row is. */
export type AssembledStudy = Omit<StudyInput, "case"> & { case?: CaseInput };

/**
 * A case row as the core reads it. For a round mouth with readings, the diameter is the smallest reading:
 * the tightest spot is the one the skirt must pass.
 */
export function caseFromRow(row: CaseRowPart): CaseInput {
  const profile = { ...row.data, name: row.name } as CaseInput;
  const readings = row.mouthReadingsMm ?? [];
  if (profile.mouth.outline.kind === "circle" && readings.length > 0) {
    const smallest = Math.min(...readings.map((r) => r.valueMm));
    return { ...profile, mouth: { ...profile.mouth, outline: { ...profile.mouth.outline, diameterMm: smallest } } };
  }
  return profile;
}

/** The core's kit from a kit row: its id and name, and its data without the price (money the core never reads). */
export function kitFromRow(k: KitRowPart): KitInput {
  const data: Record<string, unknown> = { ...k.data };
  delete data.price;
  return { ...data, id: k.id, name: k.name } as KitInput;
}

/**
 * The core's Study from a study's rows. The shop's limits come first and the study's own limits override
 * them one by one; limits are left out when neither gives any.
 */
export function assembleStudy(rows: StudyRows, shopLimits: StudyInput["limits"] | null): AssembledStudy {
  const study: AssembledStudy = {
    name: rows.name,
    kits: rows.kits.map(kitFromRow),
  };
  if (rows.case) study.case = caseFromRow(rows.case);
  if (rows.rig) study.rig = { ...rows.rig.data, name: rows.rig.name } as RigInput;
  if (rows.cut) study.cut = rows.cut;
  if (rows.readings) study.readings = rows.readings;
  const limits = { ...(shopLimits ?? {}), ...(rows.limits ?? {}) };
  if (Object.keys(limits).length > 0) study.limits = limits;
  return study;
}

/** The assembled study checked by the core's schema: the Study, or the issues that keep it from being evaluated. */
export function checkStudy(assembled: AssembledStudy): { ok: true; study: Study } | { ok: false; error: z.ZodError } {
  const r = StudySchema.safeParse(assembled);
  return r.success ? { ok: true, study: r.data } : { ok: false, error: r.error };
}

/** The limits a shop set itself, from its settings as the API gives them (every limit filled, the defaulted ones named). */
export function shopOwnLimits(settings: { limits: Record<string, unknown>; defaulted: readonly string[] }): StudyInput["limits"] {
  return Object.fromEntries(Object.entries(settings.limits).filter(([key]) => !settings.defaulted.includes(key))) as StudyInput["limits"];
}
