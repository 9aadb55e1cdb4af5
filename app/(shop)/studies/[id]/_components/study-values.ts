import { CutPlanSchema, DEFAULT_LIMITS, ReadingsSchema, StudyLimitsSchema, type LengthUnits } from "@/geometry";
import { z } from "zod";
import type { FormReader } from "@/app/_ui/form/form-reader";
import { lengthFieldText, numberFieldText } from "@/model/units";
import type { PairText } from "@/app/_ui/form/text-values";
import type { StudyRow } from "../../../../_ui/query/types";

export const LIMIT_KEYS = Object.keys(DEFAULT_LIMITS) as (keyof typeof DEFAULT_LIMITS)[];
export type LimitKey = (typeof LIMIT_KEYS)[number];

export type StudyFormValues = {
  name: string;
  notes: string;
  caseId: string;
  kitIds: string[];
  rigId: string;
  chosenKitId: string;
  cut: { diameterMm: string; depthMm: string; centerOffsetMm: PairText };
  readings: { holderHeights: { stud: string; heightMm: string; straightedgeMm: string }[] };
  limits: Record<LimitKey, string>;
};

/** What the study page validates as the user types: the core's schemas for the cut, readings and limits. */
export const StudyInputsSchema = z.object({
  name: z.string().trim().min(1, "Give the study a name.").max(80, "Keep the name to 80 characters or fewer."),
  notes: z.string().max(4000, "Keep the notes to 4000 characters or fewer."),
  cut: CutPlanSchema.optional(),
  readings: ReadingsSchema.optional(),
  limits: StudyLimitsSchema.optional(),
});
export type StudyInputs = z.output<typeof StudyInputsSchema>;

const isLength = (k: LimitKey) => k.endsWith("Mm");

export function studyDefaults(row: StudyRow, units: LengthUnits): StudyFormValues {
  const L = (v: number | undefined) => lengthFieldText(v, units);
  const limits = Object.fromEntries(
    LIMIT_KEYS.map((k) => {
      const v = row.limits?.[k];
      if (v === undefined) return [k, ""];
      return [k, Array.isArray(v) ? v.join(" ") : isLength(k) ? L(v as number) : numberFieldText(v as number)];
    }),
  ) as Record<LimitKey, string>;
  return {
    name: row.name,
    notes: row.notes ?? "",
    caseId: row.caseId,
    kitIds: row.kitIds,
    rigId: row.rigId ?? "",
    chosenKitId: row.chosenKitId ?? "",
    cut: {
      diameterMm: L(row.cut?.diameterMm),
      depthMm: L(row.cut?.depthMm),
      centerOffsetMm: row.cut?.centerOffsetMm ? [L(row.cut.centerOffsetMm[0]), L(row.cut.centerOffsetMm[1])] : ["", ""],
    },
    readings: {
      holderHeights: (row.readings?.holderHeights ?? []).map((r) => ({ stud: r.stud, heightMm: L(r.heightMm), straightedgeMm: r.straightedgeMm ? L(r.straightedgeMm) : "" })),
    },
    limits,
  };
}

/** The form's texts as the core's inputs; empty fields are left out (a proposed cut, the shop's default limit). */
export function studyToCore(v: StudyFormValues, read: FormReader): unknown {
  const blank = (t: string | undefined) => !(t ?? "").trim();
  const off = v.cut.centerOffsetMm;
  const cut = {
    ...(blank(v.cut.diameterMm) ? {} : { diameterMm: read.length(v.cut.diameterMm, ["cut", "diameterMm"]) }),
    ...(blank(v.cut.depthMm) ? {} : { depthMm: read.length(v.cut.depthMm, ["cut", "depthMm"]) }),
    ...(blank(off[0]) && blank(off[1])
      ? {}
      : { centerOffsetMm: [read.length(off[0] || "0", ["cut", "centerOffsetMm", 0]) ?? Number.NaN, read.length(off[1] || "0", ["cut", "centerOffsetMm", 1]) ?? Number.NaN] }),
  };
  const holder = v.readings.holderHeights ?? [];
  const limits: Record<string, unknown> = {};
  for (const k of LIMIT_KEYS) {
    const t = v.limits[k];
    if (blank(t)) continue;
    if (k === "displacementClassesCc") {
      limits[k] = t
        .split(/[\s;,]+/)
        .filter(Boolean)
        .map((x, i) => read.number(x, ["limits", k, i]) ?? Number.NaN);
      continue;
    }
    limits[k] = isLength(k) ? read.length(t, ["limits", k]) : read.number(t, ["limits", k]);
  }
  return {
    name: v.name,
    notes: v.notes,
    cut: Object.keys(cut).length ? cut : undefined,
    readings: holder.length
      ? {
          holderHeights: holder.map((r, i) => ({
            stud: r.stud,
            heightMm: read.length(r.heightMm, ["readings", "holderHeights", i, "heightMm"]),
            straightedgeMm: blank(r.straightedgeMm) ? 0 : read.length(r.straightedgeMm, ["readings", "holderHeights", i, "straightedgeMm"]),
          })),
        }
      : undefined,
    limits: Object.keys(limits).length ? limits : undefined,
  };
}
