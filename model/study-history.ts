import type { CutPlan, Readings, StudyLimits } from "@/geometry";
import { recordMmText } from "@/model/units";

// Plain-words summaries of what one change to a study did, for the study's history. Pure: the data layer
// writes them with each change, the tests read them directly.

/** What a study looked like before or after a change, with the names of what it refers to. */
export type StudySnapshot = {
  name: string;
  notes: string;
  caseId: string;
  kitIds: readonly string[];
  rigId: string | null;
  cut: CutPlan | null;
  readings: Readings | null;
  limits: StudyLimits | null;
  chosenKitId: string | null;
};

const LIMIT_LABELS: Record<keyof StudyLimits, [label: string, unit: string]> = {
  minRadialClearanceMm: ["minimum radial clearance", "mm"],
  minDepthClearanceMm: ["minimum depth clearance", "mm"],
  minSealingLandMm: ["minimum sealing land", "mm"],
  minWallMm: ["minimum wall", "mm"],
  studToleranceMm: ["stud tolerance", "mm"],
  hardwareMarginMm: ["hardware margin", "mm"],
  maxRockMm: ["largest holder rock", "mm"],
  minCrankClearanceMm: ["minimum clearance to the crank webs", "mm"],
  cuttingSpeedMinMPerMin: ["lowest cutting speed", "m/min"],
  cuttingSpeedMaxMPerMin: ["highest cutting speed", "m/min"],
  displacementClassesCc: ["displacement classes", "cc"],
};

function formatLimit(v: number | readonly number[] | undefined, unit: string): string {
  if (v === undefined) return "default";
  if (Array.isArray(v)) return v.length ? `${v.join(", ")} ${unit}` : "none";
  return `${recordMmText(v as number)} ${unit}`;
}

const same = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

/** Each change from one snapshot to the next, in words (names looked up through `nameOf`). */
export function describeChanges(before: StudySnapshot, after: StudySnapshot, nameOf: (id: string) => string): string[] {
  const out: string[] = [];
  if (before.name !== after.name) out.push(`renamed "${before.name}" → "${after.name}"`);
  if (before.caseId !== after.caseId) out.push(`case profile ${nameOf(before.caseId)} → ${nameOf(after.caseId)}`);

  const added = after.kitIds.filter((k) => !before.kitIds.includes(k));
  const removed = before.kitIds.filter((k) => !after.kitIds.includes(k));
  for (const k of added) out.push(`added kit ${nameOf(k)}`);
  for (const k of removed) out.push(`removed kit ${nameOf(k)}`);
  if (!added.length && !removed.length && !same(before.kitIds, after.kitIds)) out.push("reordered the kits");

  if (before.rigId !== after.rigId) {
    if (!after.rigId) out.push(`removed the rig ${nameOf(before.rigId ?? "")}`);
    else if (!before.rigId) out.push(`rig set to ${nameOf(after.rigId)}`);
    else out.push(`rig ${nameOf(before.rigId)} → ${nameOf(after.rigId)}`);
  }

  const cutValue = (c: CutPlan | null, k: "diameterMm" | "depthMm") => (c?.[k] === undefined ? "proposed" : `${recordMmText(c[k] as number)} mm`);
  for (const [k, label] of [["diameterMm", "cut diameter"], ["depthMm", "cut depth"]] as const) {
    if (!same(before.cut?.[k], after.cut?.[k])) {
      const from = cutValue(before.cut, k).replace(" mm", "");
      const to = cutValue(after.cut, k);
      out.push(`${label} ${from === "proposed" ? "proposed" : from} → ${to}`);
    }
  }
  if (!same(before.cut?.centerOffsetMm, after.cut?.centerOffsetMm)) {
    const o = after.cut?.centerOffsetMm;
    out.push(o ? `cut centring offset set to (${recordMmText(o[0])}, ${recordMmText(o[1])}) mm` : "cut centring offset removed");
  }

  if (!same(before.readings, after.readings)) {
    const n = after.readings?.holderHeights.length ?? 0;
    out.push(n ? `holder heights changed (${n} reading${n === 1 ? "" : "s"})` : "holder heights cleared");
  }

  for (const key of Object.keys(LIMIT_LABELS) as (keyof StudyLimits)[]) {
    const a = before.limits?.[key];
    const b = after.limits?.[key];
    if (!same(a, b)) {
      const [label, unit] = LIMIT_LABELS[key];
      out.push(`${label} ${formatLimit(a, unit)} → ${formatLimit(b, unit)}`);
    }
  }

  if (before.chosenKitId !== after.chosenKitId) {
    out.push(after.chosenKitId ? `chose kit ${nameOf(after.chosenKitId)}` : "cleared the chosen kit");
  }
  if (before.notes !== after.notes) out.push("edited the notes");
  return out;
}
