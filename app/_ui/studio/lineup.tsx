"use client";

import { memo, useMemo } from "react";
import type { Study, StudyResult } from "@/geometry";
import { sectionDrawing } from "@/scene/drawing/section";
import { fitState, governingClearanceMm } from "@/scene/fit";
import type { Money } from "@/model/money";
import { formatMoney } from "@/model/money-text";
import { diameterLabel, lengthLabel, signedLengthLabel } from "@/model/units";
import { VerdictMark } from "./verdict-mark";
import { BORDER, REASON_TEXT, SOFT_BG, STATE_TEXT, TEXT_COLOR } from "./words";

interface Props {
  readonly study: Study;
  readonly result: StudyResult;
  readonly kitIndex: number;
  readonly chosenKitId?: string;
  readonly units: "mm" | "in";
  readonly onPick: (i: number) => void;
  /** The library's kit prices by kit id, shown beside each kit; display only, the core never reads them. */
  readonly prices?: Readonly<Record<string, Money | undefined>>;
}

/** The kit switcher: every kit of the study with its verdict and clearance; the chosen kit marked. */
export const KitSwitcher = memo(function KitSwitcher({ result, kitIndex, chosenKitId, units, onPick, prices }: Props) {
  return (
    <fieldset className="card p-3">
      <legend className="px-1 text-sm font-medium">Kit on show</legend>
      <div className="flex flex-col gap-1.5">
        {result.kits.map((k, i) => {
          const s = fitState(k, result);
          const chosen = k.kitId === chosenKitId;
          return (
            <label key={k.kitId} className={`flex cursor-pointer items-center gap-3 rounded-md border px-3 py-2 text-sm ${i === kitIndex ? `${BORDER[s]} ${SOFT_BG[s]}` : "border-rule"}`}>
              <input type="radio" name="studio-kit" checked={i === kitIndex} onChange={() => onPick(i)} className="accent-accent" data-testid={`kit-${i}`} />
              <span className="flex-1">
                <span className="font-medium">{k.name}</span>
                {chosen && <span className="ml-2 rounded bg-accent px-1.5 py-0.5 text-xs text-paper">the choice</span>}
                <span className="block text-xs text-ink-2">
                  <VerdictMark verdict={k.verdict} className="font-medium" />
                  {k.verdict === "cannot-fit" && k.reasons.length > 1 ? ` — ${REASON_TEXT[k.reasons[k.reasons.length - 1]]}` : ""}
                  {k.cut ? ` · cut ${diameterLabel(k.cut.diameterMm, units)}` : ""}
                  {/* A price shows only as money with its currency (a bare number in a study file shows nothing). */}
                  {prices?.[k.kitId] ? ` · price ${formatMoney(prices[k.kitId]!)}` : ""}
                </span>
              </span>
              <span className={`num text-right font-semibold ${TEXT_COLOR[s]}`}>
                <span className="text-xs font-normal">skirt</span> {STATE_TEXT[s]}
                <span className="block text-xs">{signedLengthLabel(governingClearanceMm(k), units)}</span>
              </span>
            </label>
          );
        })}
      </div>
    </fieldset>
  );
});

/** Every kit as a small section drawing, side by side; a click shows that kit in the main view. */
export const SmallMultiples = memo(function SmallMultiples({ study, result, kitIndex, chosenKitId, units, onPick }: Props) {
  const drawings = useMemo(() => result.kits.map((_, i) => sectionDrawing(study, result, i, units, { compact: true })), [study, result, units]);
  return (
    <ul className="grid h-full grid-cols-2 gap-2 overflow-auto p-2 lg:grid-cols-3" aria-label="Kits side by side">
      {result.kits.map((k, i) => {
        const s = fitState(k, result);
        return (
          <li key={k.kitId}>
            <button
              type="button"
              onClick={() => onPick(i)}
              aria-pressed={i === kitIndex}
              className={`flex w-full flex-col gap-1 rounded-md border-2 bg-card p-2 text-left text-xs ${i === kitIndex ? BORDER[s] : "border-rule"}`}
            >
              <span className="w-full [&>svg]:h-auto [&>svg]:w-full" dangerouslySetInnerHTML={{ __html: drawings[i].svg }} />
              <span className={`num font-semibold ${TEXT_COLOR[s]}`}>
                {STATE_TEXT[s]} {signedLengthLabel(governingClearanceMm(k), units)}
              </span>
              <span className="text-ink-2">
                <VerdictMark verdict={k.verdict} />
                {k.thinnestWall ? ` · wall ${lengthLabel(k.thinnestWall.minWallMm, units)}` : ""}
                {k.kitId === chosenKitId ? " · the choice" : ""}
              </span>
            </button>
          </li>
        );
      })}
    </ul>
  );
});
