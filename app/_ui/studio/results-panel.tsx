"use client";

import { memo } from "react";
import type { KitResult, StudyResult } from "@/geometry";
import { fitState, governingClearanceMm } from "@/scene/fit";
import { diameterLabel, fixedText, lengthLabel, messageInUnits, signedLengthLabel, volumeLabel } from "@/model/units";
import { blockingReasons } from "@/model/verdict";
import { REASON_TEXT, STATE_TEXT, TEXT_COLOR, VERDICT_TEXT } from "./words";

interface Props {
  readonly result: StudyResult;
  readonly kitIndex: number;
  /** The existing mouth's diameter when it is round (null for an outline), to say when the largest safe cut is smaller. */
  readonly mouthDiameterMm: number | null;
  readonly units: "mm" | "in";
  readonly large: boolean;
}

/** The fit in words and numbers: the text alternative to the 3D view, read out when it changes. */
export const ResultsPanel = memo(function ResultsPanel({ result, kitIndex, mouthDiameterMm, units, large }: Props) {
  const k: KitResult = result.kits[kitIndex];
  const state = fitState(k, result);
  const L = result.limits.values;
  const c = governingClearanceMm(k);
  const f = (mm: number) => lengthLabel(mm, units);
  const rows: [string, string, string?][] = [
    [k.cut ? "Skirt in the cut" : "Skirt in the mouth", `${signedLengthLabel(c, units)} radial`, `minimum ${f(L.minRadialClearanceMm)}${k.alignment ? ", tilt and offset counted" : ""}`],
    ["Skirt in the stock mouth", signedLengthLabel(k.radialClearanceMm.vsMouth, units)],
    ["Skirt", `${diameterLabel(k.skirt.diameterMm, units)}, ${f(k.skirt.protrusionMm)} below the deck`, k.skirt.gasketMm > 0 ? `base gasket ${f(k.skirt.gasketMm)} counted` : "no gasket counted"],
  ];
  if (k.cut) {
    rows.push(["Planned cut", `${diameterLabel(k.cut.diameterMm, units)} × ${f(k.cut.depthMm)} deep`, k.cut.diameterProposed && k.cut.depthProposed ? "the least cut for this kit" : k.cut.proposed ? `the least ${k.cut.diameterProposed ? "diameter" : "depth"} for this kit` : "as set"]);
    rows.push(["Depth clearance", k.depthClearanceMm === null ? "no step left" : signedLengthLabel(k.depthClearanceMm, units), `minimum ${f(L.minDepthClearanceMm)}`]);
  }
  if (k.leastCut) rows.push(["Least cut that clears", `${diameterLabel(k.leastCut.diameterMm, units)} × ${f(k.leastCut.depthMm)} deep`]);
  if (k.thinnestWall) rows.push(["Thinnest wall", `${f(k.thinnestWall.minWallMm)} at ${k.thinnestWall.label}`, `needs ${f(k.thinnestWall.requiredMm)}${k.thinnestWall.ok ? "" : " — too thin"}`]);
  const belowMouth = mouthDiameterMm !== null && k.maxCutDiameterMm < mouthDiameterMm;
  rows.push(["Largest cut the case takes", diameterLabel(k.maxCutDiameterMm, units), belowMouth ? "smaller than the existing mouth: a wall is already below the minimum before any cut" : undefined]);
  rows.push(["Stud pattern", k.studMatch.ok ? "lines up" : `off by ${f(k.studMatch.worstOffsetMm)}`]);
  const d = k.displacementCc;
  rows.push(["Displacement", `${d.stockRounded} → ${d.kitRounded} cc`, `${d.change >= 0 ? "+" : ""}${fixedText(d.change, 1)} cc`]);
  if (k.cut) rows.push(["Aluminium removed", `${volumeLabel(k.removal.volumeMm3, units)}, ${k.removal.massG.toFixed(1)} g`]);
  if (k.rig) {
    rows.push(["Cutter setting", `${f(k.rig.cutterSettingToSetMm ?? k.rig.cutterSettingMm)} across head and bit`, k.rig.bitReaches ? "bit reaches" : "bit cannot reach"]);
    const ds = k.rig.depthStop;
    rows.push(["Depth stop", `${ds.groove}${ds.shimCount ? ` + ${ds.shims.map((s) => `${s.count}×${f(s.thicknessMm)}`).join(" + ")}` : ""}`, ds.reached ? `overshoot ${f(ds.overshootMm)}` : "cannot reach"]);
    rows.push(["Spindle", `${Math.round(k.rig.spindleRpm.min)}–${Math.round(k.rig.spindleRpm.max)} rpm`, k.rig.spindleRpm.drillTooSlow ? "drill too slow" : `drill tops at ${k.rig.spindleRpm.drillTopRpm}`]);
  }
  if (k.alignment) rows.push(["Holder tilt", `${k.alignment.tiltDeg.toFixed(3)}° toward ${k.alignment.directionDeg.toFixed(0)}°`, `axis shift at the bottom ${f(k.alignment.lateralShiftMm)}`]);
  const problems = k.reasons.filter((r) => r !== "needs-cut" && r !== "clears-existing-mouth");
  // A kit that cannot fit leads with the reason that decides it, never with a clearance figure beside the "no".
  const deciding = blockingReasons(k)[0];

  return (
    <section aria-label="Fit results" aria-live="polite" className={`card flex flex-col gap-3 p-4 ${large ? "text-lg" : "text-sm"}`} data-testid="results">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 className={`${large ? "text-3xl" : "text-xl"} font-semibold`}>{k.name}</h2>
        <p className={`font-semibold ${k.verdict === "cannot-fit" ? TEXT_COLOR.interfere : TEXT_COLOR[state]} ${large ? "text-2xl" : "text-base"}`} data-testid="verdict" data-state={state} data-verdict={k.verdict} data-cut={k.cut ? k.cut.diameterMm.toFixed(2) : "none"}>
          {k.verdict === "cannot-fit" && deciding ? (
            <>
              {VERDICT_TEXT[k.verdict]}: {deciding}
            </>
          ) : (
            <>
              {VERDICT_TEXT[k.verdict]} · {STATE_TEXT[state]} <span className="num">{signedLengthLabel(c, units)}</span>
            </>
          )}
        </p>
      </div>
      {problems.length > 0 && (
        <ul className="list-disc pl-5 text-interfere">
          {problems.map((r) => (
            <li key={r}>{REASON_TEXT[r]}</li>
          ))}
        </ul>
      )}
      <dl className="grid grid-cols-[minmax(7rem,40%)_1fr] gap-x-3 gap-y-1.5">
        {rows.map(([t, v, note]) => (
          <div key={t} className="contents">
            <dt className="text-ink-2">{t}</dt>
            <dd>
              <span className="num">{v}</span>
              {note && <span className="block text-xs text-ink-3">{note}</span>}
            </dd>
          </div>
        ))}
      </dl>
      {k.warnings.length + result.warnings.length > 0 && (
        <div>
          <h3 className="font-medium">Worth a look</h3>
          <ul className="mt-1 list-disc pl-5 text-ink-2">
            {[...result.warnings, ...k.warnings].map((w, i) => (
              <li key={`${w.code}-${i}`}>{messageInUnits(w.message, units)}</li>
            ))}
          </ul>
        </div>
      )}
      {result.limits.defaulted.length > 0 && (
        <p className="text-xs text-ink-3">Limits at their defaults: {result.limits.defaulted.map((n) => n.replace(/Mm$|MPerMin$|Cc$/, "").replace(/([A-Z])/g, " $1").toLowerCase()).join(", ")}.</p>
      )}
    </section>
  );
});
