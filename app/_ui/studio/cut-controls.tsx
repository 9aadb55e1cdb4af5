"use client";

import { memo, useEffect, useId, useRef, useState } from "react";
import { lengthFieldText, lengthLabel, parseLengthText } from "@/model/units";

/** A figure marked on the slider's track: a point, or a band from one value to another. */
export type TrackMark = { readonly label: string; readonly fromMm: number; readonly toMm?: number; readonly tone: "accent" | "interfere" };

const MARK_COLOR = { accent: "bg-accent", interfere: "bg-interfere" } as const;

/** The marks under a range input, placed where its thumb would stand (the thumb is about 16 px wide). */
function TrackMarks({ marks, minMm, maxMm }: { marks: readonly TrackMark[]; minMm: number; maxMm: number }) {
  const at = (mm: number) => `calc(8px + (100% - 16px) * ${Math.min(1, Math.max(0, (mm - minMm) / (maxMm - minMm)))})`;
  return (
    <div className="flex flex-col gap-0.5" data-testid="track-marks">
      <div className="relative h-1.5" aria-hidden>
        {marks.map((m) =>
          m.toMm === undefined ? (
            <span key={m.label} className={`absolute top-0 h-1.5 w-0.5 ${MARK_COLOR[m.tone]}`} style={{ left: at(m.fromMm) }} />
          ) : (
            <span key={m.label} className={`absolute top-0.5 h-0.5 opacity-60 ${MARK_COLOR[m.tone]}`} style={{ left: at(m.fromMm), width: `calc(${at(m.toMm)} - ${at(m.fromMm)})` }} />
          ),
        )}
      </div>
      <p className="text-xs text-ink-3">
        {marks.map((m, i) => (
          <span key={m.label} className="num">
            {i > 0 ? " · " : ""}
            <span className={`mr-1 inline-block h-2 w-2 rounded-sm align-middle ${MARK_COLOR[m.tone]}`} aria-hidden />
            {m.label}
          </span>
        ))}
      </p>
    </div>
  );
}

export interface CutSliderProps {
  readonly label: string;
  readonly valueMm: number;
  readonly minMm: number;
  readonly maxMm: number;
  readonly stepMm: number;
  readonly units: "mm" | "in";
  readonly hint?: string;
  /** Figures marked on the track (the rig's reach, the largest safe cut). */
  readonly marks?: readonly TrackMark[];
  readonly testId: string;
  /** While dragging or stepping: the new value and the input's time stamp. */
  readonly onLive: (mm: number, at: number) => void;
  /** When the drag ends or a typed value is entered. */
  readonly onCommit: (mm: number) => void;
}

/** Calls `onCommit` with the range's value on its native change event: once when a drag ends, and on each key step. */
function useRangeCommit(onCommit: (mm: number) => void) {
  const range = useRef<HTMLInputElement>(null);
  const commitRef = useRef(onCommit);
  useEffect(() => {
    commitRef.current = onCommit;
  }, [onCommit]);
  useEffect(() => {
    const el = range.current;
    if (!el) return;
    const onChange = () => commitRef.current(Number(el.value));
    el.addEventListener("change", onChange);
    return () => el.removeEventListener("change", onChange);
  }, []);
  return range;
}

/** The typed length beside a slider: what is typed is kept while it is wrong, with the message that names the last valid value. */
function useLengthText({ valueMm, minMm, maxMm, units, onCommit }: Pick<CutSliderProps, "valueMm" | "minMm" | "maxMm" | "units" | "onCommit">) {
  // While the field has focus it keeps what is typed; otherwise it shows the current value.
  const [typed, setTyped] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const text = typed ?? lengthFieldText(valueMm, units);
  const submit = () => {
    if (typed === null) return;
    // While the text is wrong the results stay at the last valid value, and the message names it.
    const basis = ` The results are for ${lengthLabel(valueMm, units)}, the last valid value.`;
    const r = parseLengthText(text, units);
    if (!r.ok) return setError(`${r.message[0].toUpperCase()}${r.message.slice(1)}.${basis}`);
    if (r.value === undefined) return setError(`Enter a number.${basis}`);
    const mm = r.value;
    if (mm < minMm || mm > maxMm) return setError(`Enter a value from ${lengthLabel(minMm, units)} to ${lengthLabel(maxMm, units)}.${basis}`);
    setError(null);
    setTyped(null);
    onCommit(mm);
  };
  return { text, error, type: setTyped, submit };
}

/**
 * A slider and a number field for one length, in the user's units; the slider works in mm steps. Drawn again
 * only when a prop changes, so give it steady handlers.
 */
export const CutSlider = memo(function CutSlider({ label, valueMm, minMm, maxMm, stepMm, units, hint, marks, testId, onLive, onCommit }: CutSliderProps) {
  const id = useId();
  const range = useRangeCommit(onCommit);
  const { text, error, type, submit } = useLengthText({ valueMm, minMm, maxMm, units, onCommit });

  return (
    <div className="flex flex-col gap-1">
      <div className="flex items-baseline justify-between gap-3">
        <label htmlFor={`${id}-r`} className="field-label">
          {label}
        </label>
        <span className="num text-sm text-ink-2" aria-hidden>
          {lengthLabel(valueMm, units)}
        </span>
      </div>
      <div className="flex items-center gap-3">
        <input
          ref={range}
          id={`${id}-r`}
          type="range"
          data-testid={testId}
          className="h-2 w-full cursor-pointer accent-accent"
          min={minMm}
          max={maxMm}
          step={stepMm}
          value={valueMm}
          aria-valuetext={lengthLabel(valueMm, units)}
          onInput={(e) => onLive(Number(e.currentTarget.value), e.timeStamp || performance.now())}
          onChange={() => undefined}
        />
        <input
          id={`${id}-n`}
          aria-label={`${label} (${units})`}
          data-testid={`${testId}-field`}
          className="field-input num mt-0 w-28 py-1 text-right"
          inputMode="decimal"
          value={text}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-e` : hint ? `${id}-h` : undefined}
          onChange={(e) => type(e.target.value)}
          onBlur={submit}
          onKeyDown={(e) => {
            if (e.key === "Enter") submit();
          }}
        />
      </div>
      {marks && marks.length > 0 ? (
        <div className="pr-[7.75rem]">
          <TrackMarks marks={marks} minMm={minMm} maxMm={maxMm} />
        </div>
      ) : null}
      {error ? (
        <p id={`${id}-e`} className="field-error" role="alert">
          {error}
        </p>
      ) : hint ? (
        <p id={`${id}-h`} className="field-hint">
          {hint}
        </p>
      ) : null}
    </div>
  );
});
