"use client";

import { memo } from "react";
import type { KitResult, StudyResult } from "@/geometry";
import { fitState, governingClearanceMm } from "@/scene/fit";
import { defaultedLimitsText, type Term } from "@/model/glossary";
import { messageInUnits, signedLengthLabel } from "@/model/units";
import { blockingReasons } from "@/model/verdict";
import { FIT } from "@/model/palette";
import { resultRows } from "./results-rows";
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

/** The fit in words and numbers: the text alternative to the 3D view, read out when it changes. */
export const ResultsPanel = memo(function ResultsPanel({ result, kitIndex, mouthDiameterMm, units, large }: Props) {
  const k: KitResult = result.kits[kitIndex];
  const state = fitState(k, result);
  const c = governingClearanceMm(k);
  const name = (t: Term) => (large ? t.plain : t.label);
  const rows = resultRows(k, result.limits.values, units, mouthDiameterMm);
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
