"use client";

import { memo } from "react";
import type { KitResult, StudyResult } from "@/geometry";
import { fitState, governingClearanceMm } from "@/scene/fit";
import { defaultedLimitsText, TERM, type Term } from "@/model/glossary";
import { areaLabel, diameterLabel, fixedText, lengthLabel, messageInUnits, signedLengthLabel, volumeLabel } from "@/model/units";
import { blockingReasons } from "@/model/verdict";
import { FIT } from "@/model/palette";
import { VerdictGlyph, VERDICT_CLASS } from "./verdict-mark";
import { REASON_TEXT, STATE_TEXT, TEXT_COLOR, VERDICT_TEXT } from "./words";

interface Props {
  readonly result: StudyResult;
  readonly kitIndex: number;
  /** The existing mouth's diameter when it is round (null for an outline), to say when the largest safe cut is smaller. */
  readonly mouthDiameterMm: number | null;
  readonly units: "mm" | "in";
  /** Customer mode: large type and plain words, no shop settings. */
  readonly large: boolean;
}

type Row = { term: Term; value: string; note?: string; testId?: string };

/** The fit in words and numbers: the text alternative to the 3D view, read out when it changes. */
export const ResultsPanel = memo(function ResultsPanel({ result, kitIndex, mouthDiameterMm, units, large }: Props) {
  const k: KitResult = result.kits[kitIndex];
  const state = fitState(k, result);
  const L = result.limits.values;
  const c = governingClearanceMm(k);
  const f = (mm: number) => lengthLabel(mm, units);
  const name = (t: Term) => (large ? t.plain : t.label);
  const minimum = `minimum ${f(L.minRadialClearanceMm)}`;
  const mouth = k.interference.vsMouth && k.interference.vsMouth.deepestMm > 0 ? `deepest at ${Math.round(k.interference.vsMouth.angleDeg)}°, ${areaLabel(k.interference.vsMouth.areaMm2, units)} overlap` : undefined;
  const rows: Row[] = [];
  if (k.cut) rows.push({ term: TERM.clearanceToCut, value: signedLengthLabel(c, units), note: `${minimum}${k.alignment ? "; tilt and offset counted" : ""}`, testId: "clearance" });
  rows.push({ term: TERM.clearanceToMouth, value: signedLengthLabel(k.radialClearanceMm.vsMouth, units), note: k.cut ? mouth : [minimum, mouth].filter(Boolean).join("; "), testId: k.cut ? undefined : "clearance" });
  rows.push({ term: TERM.skirtDiameter, value: diameterLabel(k.skirt.diameterMm, units) });
  rows.push({ term: TERM.skirtProtrusion, value: f(k.skirt.protrusionMm), note: k.skirt.gasketMm > 0 ? `base gasket ${f(k.skirt.gasketMm)} counted` : "no gasket counted" });
  if (k.cut) {
    const how = k.cut.diameterProposed && k.cut.depthProposed ? "the least cut for this kit" : k.cut.proposed ? `the least ${k.cut.diameterProposed ? "diameter" : "depth"} for this kit` : "as set";
    rows.push({ term: TERM.plannedCut, value: `${diameterLabel(k.cut.diameterMm, units)} × ${f(k.cut.depthMm)} deep`, note: `${how}${k.cut.throughMouth ? "; runs through the mouth: no step is left" : ""}`, testId: "planned-cut" });
    rows.push({ term: TERM.depthClearance, value: k.depthClearanceMm === null ? "no step left" : signedLengthLabel(k.depthClearanceMm, units), note: `minimum ${f(L.minDepthClearanceMm)}` });
  }
  // The least cut once: as its own row only when the planned cut is not already it.
  if (k.leastCut && !(k.cut?.diameterProposed && k.cut.depthProposed)) rows.push({ term: TERM.leastCut, value: `${diameterLabel(k.leastCut.diameterMm, units)} × ${f(k.leastCut.depthMm)} deep` });
  if (k.thinnestWall) rows.push({ term: TERM.thinnestWall, value: `${f(k.thinnestWall.minWallMm)} at ${k.thinnestWall.label}`, note: `needs ${f(k.thinnestWall.requiredMm)}${k.thinnestWall.ok ? "" : " — too thin"}` });
  const belowMouth = mouthDiameterMm !== null && k.maxCutDiameterMm < mouthDiameterMm;
  rows.push({ term: TERM.largestCut, value: diameterLabel(k.maxCutDiameterMm, units), note: belowMouth ? "smaller than the existing mouth: a wall is already below the minimum before any cut" : undefined });
  const thread = k.studMatch.thread ? `; thread ${k.studMatch.thread.kit} on the kit, ${k.studMatch.thread.case} in the case` : "";
  rows.push({ term: TERM.studPattern, value: k.studMatch.ok ? "lines up" : `off by ${f(k.studMatch.worstOffsetMm)}`, note: thread ? thread.slice(2) : undefined });
  rows.push({
    term: TERM.crankClearance,
    value: k.crank.checked && k.crank.clearanceMm !== null ? signedLengthLabel(k.crank.clearanceMm, units) : "not checked",
    note: k.crank.checked ? `needs ${f(k.crank.requiredMm)}` : "the case profile gives no crank chamber",
  });
  const d = k.displacementCc;
  rows.push({ term: TERM.displacement, value: `${d.stockRounded} → ${d.kitRounded} cc`, note: d.crossesClasses.length ? `crosses ${d.crossesClasses.join(", ")} cc: the legal class may change` : `${d.change >= 0 ? "+" : ""}${fixedText(d.change, 1)} cc` });
  if (k.cut) rows.push({ term: TERM.removed, value: `${volumeLabel(k.removal.volumeMm3, units)}, ${k.removal.massG.toFixed(1)} g` });
  const problems = k.reasons.filter((r) => r !== "needs-cut" && r !== "clears-existing-mouth");
  // A kit that cannot fit leads with the reason that decides it, never with a clearance figure beside the "no".
  const deciding = blockingReasons(k)[0];
  const warnings = [...result.warnings, ...k.warnings];

  return (
    <section aria-label="Fit results" aria-live="polite" className={`card flex flex-col gap-3 p-4 ${large ? "text-lg" : "text-sm"}`} data-testid="kit-results">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 className={`${large ? "text-3xl" : "text-xl"} font-semibold`}>{k.name}</h2>
        {/* The verdict in its colour with its glyph; the clearance beside it keeps its band's colour and glyph. */}
        <p className={`font-semibold ${VERDICT_CLASS[k.verdict]} ${large ? "text-2xl" : "text-base"}`} data-testid="verdict" data-state={state} data-verdict={k.verdict} data-cut={k.cut ? k.cut.diameterMm.toFixed(2) : "none"}>
          <VerdictGlyph verdict={k.verdict} />
          {k.verdict === "cannot-fit" && deciding ? (
            <>
              {VERDICT_TEXT[k.verdict]}: {deciding}
            </>
          ) : (
            <>
              {VERDICT_TEXT[k.verdict]} ·{" "}
              <span className={TEXT_COLOR[state]} data-testid="verdict-clearance">
                <span aria-hidden="true">{FIT[state].icon} </span>
                {STATE_TEXT[state]} <span className="num">{signedLengthLabel(c, units)}</span>
              </span>
            </>
          )}
        </p>
      </div>
      {problems.length > 0 && (
        <ul className="list-disc pl-5 text-verdict-cannot">
          {problems.map((r) => (
            <li key={r}>{REASON_TEXT[r]}</li>
          ))}
        </ul>
      )}
      <dl className="grid grid-cols-[minmax(7rem,40%)_1fr] gap-x-3 gap-y-1.5">
        {rows.map((r) => (
          <div key={r.term.label} className="contents">
            <dt className="text-ink-2">{name(r.term)}</dt>
            <dd data-testid={r.testId}>
              <span className="num">{r.value}</span>
              {r.note && <span className="block text-xs text-ink-3">{r.note}</span>}
            </dd>
          </div>
        ))}
      </dl>
      {warnings.length > 0 && (
        <div>
          <h3 className="font-medium">Warnings</h3>
          <ul className="mt-1 list-disc pl-5 text-ink-2" aria-label="Warnings" data-testid="warnings">
            {warnings.map((w, i) => (
              <li key={`${w.code}-${i}`}>{messageInUnits(w.message, units)}</li>
            ))}
          </ul>
        </div>
      )}
      {!large && result.limits.defaulted.length > 0 && <p className="text-xs text-ink-3">At the product&apos;s defaults (no shop or study value): {defaultedLimitsText(result.limits.defaulted)}.</p>}
    </section>
  );
});
