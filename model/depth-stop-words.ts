import type { RigResult } from "@/geometry";
import { fixedText, lengthLabel, LENGTH_DIGITS, toUnits, UNIT_TEXT, type LengthUnits } from "./units";

type DepthStop = RigResult["depthStop"];

// The depth stop in the bench's words, for the studio, the setup card and its PDF. Shims under the ring take
// travel away, so the sentence gives the ring's groove, the stack under it and where the stop lands — never a
// sum that reads as if shims added travel.

/** "ring in groove 2 with 0.80 mm of shims: stops at 25.30 mm" ("…, no shims: stops at …" for a bare groove). */
export function depthStopSentence(ds: DepthStop, units: LengthUnits): string {
  if (!ds.reached) return `cannot stop at ${lengthLabel(ds.wantedMm, units)} with the grooves and shims at hand (the most is ${lengthLabel(ds.travelMm, units)})`;
  const stack = ds.shims.length ? ` with ${lengthLabel(ds.shimStackMm, units)} of shims` : ", no shims";
  return `ring in ${ds.groove}${stack}: stops at ${lengthLabel(ds.travelMm, units)}`;
}

/** The stack's make-up, "shims: 3 × 0.10 + 1 × 0.50 mm"; null with no shims. */
export function shimBreakdown(ds: DepthStop, units: LengthUnits): string | null {
  if (!ds.reached || ds.shims.length === 0) return null;
  const t = (mm: number) => fixedText(toUnits(mm, units), LENGTH_DIGITS[units]);
  return `shims: ${ds.shims.map((s) => `${s.count} × ${t(s.thicknessMm)}`).join(" + ")} ${UNIT_TEXT[units]}`;
}
