"use client";

import { useMemo } from "react";
import type { KitResult, Study, StudyResult } from "@/geometry";
import { TERM } from "@/model/glossary";
import { diameterLabel, lengthLabel, type LengthUnits } from "@/model/units";
import { CutSlider, type TrackMark } from "./cut-controls";
import type { CutDraft } from "./use-live-fit";

const STEP_MM = 0.05;

/** The slider ranges: the cut from below the smallest skirt to past the rig's reach and the case's largest safe cut. */
export function cutRanges(study: Study, result: StudyResult) {
  const skirts = result.kits.map((k) => k.skirt.diameterMm);
  const reach = result.kits.find((k) => k.rig)?.rig?.bitReachMm ?? null;
  const lo = Math.floor(Math.min(Math.min(...skirts) - 4, reach?.min ?? Infinity));
  const hi = Math.ceil(Math.max(result.case.maxCutDiameterMm, Math.max(...skirts) + 4, (reach?.max ?? 0) + 1));
  return { dMin: lo, dMax: Math.max(hi, lo + 2), zMin: 1, zMax: Math.ceil(study.case.mouth.depthMm + 4), reach };
}

/** Why the least cut moves in steps: the caliper reads the setting in the rig's resolution, and the cut is twice the setting. */
export function stepNote(k: KitResult, units: LengthUnits): string {
  if (!k.rig) return `is rounded up to the next ${lengthLabel(0.1, units)} of diameter`;
  const res = k.rig.settingResolutionMm;
  return `moves in ${lengthLabel(2 * res, units)} steps: the caliper reads the setting across head and bit in ${lengthLabel(res, units)} steps, and the cut is twice the setting less the head`;
}

type OnCutChange = (patch: CutDraft, final: boolean, at?: number) => void;

/**
 * Each length's live and final handlers, made once per `onChange`: a slider whose figures did not move
 * (the depth while the diameter is dragged) is then given the same props and is not drawn again.
 */
function useSliderHandlers(onChange: OnCutChange) {
  return useMemo(() => {
    const of = (part: keyof CutDraft) => ({
      onLive: (mm: number, at: number) => onChange({ [part]: mm }, false, at),
      onCommit: (mm: number) => onChange({ [part]: mm }, true),
    });
    return { diameterMm: of("diameterMm"), depthMm: of("depthMm") };
  }, [onChange]);
}

type Props = {
  study: Study;
  result: StudyResult;
  kit: KitResult;
  units: LengthUnits;
  /** True while the cut is each kit's least cut (no number typed): it follows the readings. */
  following: boolean;
  onChange: OnCutChange;
};

/** The planned cut: diameter and depth sliders with their fields, the rig's reach and the largest safe cut on the track. */
export function CutCard({ study, result, kit, units, following, onChange }: Props) {
  const handlers = useSliderHandlers(onChange);
  const r = cutRanges(study, result);
  const least = kit.leastCut;
  const marks: TrackMark[] = [{ label: `${TERM.largestCut.short.toLowerCase()} ${diameterLabel(kit.maxCutDiameterMm, units)}`, fromMm: kit.maxCutDiameterMm, tone: "interfere" }];
  if (r.reach) marks.unshift({ label: `rig reaches ${diameterLabel(r.reach.min, units)} – ${lengthLabel(r.reach.max, units)}`, fromMm: r.reach.min, toMm: r.reach.max, tone: "accent" });
  const dNow = kit.cut?.diameterMm ?? least?.diameterMm ?? kit.skirt.diameterMm;
  const zNow = kit.cut?.depthMm ?? least?.depthMm ?? Math.max(1, kit.skirt.protrusionMm);
  // One slider a length of the cut: what it is called, where it stands and ranges, and what it says of the least cut.
  const sliders = [
    {
      part: "diameterMm",
      label: TERM.cutDiameter.label,
      testId: "cut-diameter",
      valueMm: dNow,
      minMm: r.dMin,
      maxMm: r.dMax,
      marks,
      hint: least ? `${following ? "Least cut, followed: " : "Least that clears this kit: "}${lengthLabel(least.diameterMm, units)}; it ${stepNote(kit, units)}.` : undefined,
    },
    { part: "depthMm", label: TERM.cutDepth.label, testId: "cut-depth", valueMm: zNow, minMm: r.zMin, maxMm: r.zMax, marks: undefined, hint: least ? `Least for this kit: ${lengthLabel(least.depthMm, units)}` : undefined },
  ] as const;
  return (
    <div className="card grid gap-4 p-4 md:grid-cols-2" aria-label={TERM.plannedCut.label}>
      {sliders.map(({ part, ...slider }) => (
        <CutSlider key={part} {...slider} {...handlers[part]} stepMm={STEP_MM} units={units} />
      ))}
      <div className="flex flex-wrap items-center gap-2 md:col-span-2">
        {least && (
          <button type="button" className="btn-quiet" aria-pressed={following} onClick={() => onChange({ diameterMm: undefined, depthMm: undefined }, true)} data-testid="use-least-cut">
            Use the least cut for this kit
          </button>
        )}
        <p className="text-xs text-ink-2" data-testid="cut-mode">
          {following ? "The cut is each kit's least cut and follows the readings; type or drag to fix a number." : "The cut is fixed at the numbers above."}
        </p>
      </div>
    </div>
  );
}
