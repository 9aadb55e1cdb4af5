import type { StudyResult } from "@/geometry";
import { lengthLabel } from "@/model/units";
import { STATE_MEANING, STATE_TEXT } from "./words";

const SWATCH = { interfere: "bg-interfere", tight: "bg-tight", clear: "bg-clear" } as const;

/** What each colour of the 3D view and the drawings means, with the shop's numbers. */
export function Legend({ result, units, large }: { result: StudyResult; units: "mm" | "in"; large: boolean }) {
  const min = lengthLabel(result.limits.values.minRadialClearanceMm, units);
  const limits = { interfere: "below 0", tight: `0 to ${min}`, clear: `${min} or more` } as const;
  return (
    <div className={`card p-3 ${large ? "text-base" : "text-xs"}`} aria-label="Colour key">
      <ul className="flex flex-col gap-1.5">
        {(["interfere", "tight", "clear"] as const).map((s) => (
          <li key={s} className="flex items-center gap-2">
            <span className={`inline-block h-3 w-3 shrink-0 rounded-sm ${SWATCH[s]}`} aria-hidden />
            <span>
              <b>{STATE_TEXT[s]}</b> <span className="num">({limits[s]})</span>: {STATE_MEANING[s]}
            </span>
          </li>
        ))}
        <li className="flex items-center gap-2">
          <span className="inline-block h-3 w-3 shrink-0 rounded-sm bg-[#e0301e]" aria-hidden />
          <span>Red solid: case material the skirt would occupy</span>
        </li>
        <li className="flex items-center gap-2">
          <span className="inline-block h-3 w-3 shrink-0 rounded-sm bg-accent opacity-40" aria-hidden />
          <span>See-through teal: the planned counterbore</span>
        </li>
      </ul>
    </div>
  );
}
