import { AfterCutReadingsSchema, type AfterCutReadings, type TrialFit } from "@/db/verification";

// The after-cut readings form's text and the request it becomes: pure, so what is refused and why is one function.

/** What the readings form holds, as typed. */
export type ReadingsText = { diam: string; depth: string; lands: Record<string, string>; gasket: string; chips: boolean; trial: TrialFit; notes: string };

/** The form's text for the last readings saved, or empty fields. */
export function readingsText(previous: AfterCutReadings | null, studs: string[]): ReadingsText {
  return {
    diam: previous?.cutDiameterMm.join(" ") ?? "",
    depth: previous?.cutDepthMm.join(" ") ?? "",
    lands: Object.fromEntries(studs.map((s) => [s, String(previous?.sealingLandMm.find((l) => l.stud === s)?.valueMm ?? "")])),
    gasket: previous ? String(previous.gasketStackMm) : "",
    chips: previous?.chipsCleaned ?? false,
    trial: previous?.trialFit ?? "not-tried",
    notes: previous?.notes ?? "",
  };
}

/** Reads "55.10 55.12, 55.08" into numbers; a comma as a decimal point is refused in words, not guessed. */
function parseList(text: string): { values: number[]; error?: string } {
  const parts = text.split(/[\s;]+/).map((p) => p.trim()).filter(Boolean);
  if (parts.some((p) => /^\d+,\d+$/.test(p))) return { values: [], error: "Use a point for decimals (55.10), and spaces between readings." };
  const values = parts.map(Number);
  if (values.some((v) => !Number.isFinite(v))) return { values: [], error: "Each reading is a number in mm, separated by spaces." };
  return { values };
}

const issuesOf = (r: ReturnType<typeof AfterCutReadingsSchema.safeParse>) => {
  const out: Record<string, string> = {};
  if (!r.success) for (const i of r.error.issues) out[i.path.map(String)[0] ?? ""] ??= i.message;
  return out;
};

const NUMBER = /^\d+(\.\d+)?$/;

/** The request body the readings make, and what is wrong with them keyed by field (empty when they may be sent). */
export function readingsRequest(t: ReadingsText, studs: string[]): { body: Record<string, unknown>; errors: Record<string, string> } {
  const d = parseList(t.diam);
  const z = parseList(t.depth);
  const f: Record<string, string> = {};
  if (d.error) f.cutDiameterMm = d.error;
  if (z.error) f.cutDepthMm = z.error;
  const sealing = studs.filter((s) => t.lands[s]?.trim()).map((s) => ({ stud: s, valueMm: Number(t.lands[s].replace(/\s/g, "")) }));
  studs.forEach((s) => {
    const raw = t.lands[s]?.trim() ?? "";
    if (raw && !NUMBER.test(raw)) f[`land-${s}`] = "A number in mm, with a point for decimals.";
  });
  if (t.gasket.trim() && !NUMBER.test(t.gasket.trim())) f.gasketStackMm = "A number in mm, with a point for decimals.";
  const body = { cutDiameterMm: d.values, cutDepthMm: z.values, sealingLandMm: sealing, gasketStackMm: t.gasket.trim() === "" ? Number.NaN : Number(t.gasket), chipsCleaned: t.chips, trialFit: t.trial, ...(t.notes ? { notes: t.notes } : {}) };
  Object.assign(f, { ...issuesOf(AfterCutReadingsSchema.safeParse(body)), ...f });
  if (t.gasket.trim() === "") f.gasketStackMm = "Give the gasket stack used (0 for none).";
  return { body, errors: f };
}
