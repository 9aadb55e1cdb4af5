"use client";

import { useEffect, useId, useRef, useState } from "react";
import { lengthFieldText, lengthLabel, parseLengthText } from "@/model/units";

export interface CutSliderProps {
  readonly label: string;
  readonly valueMm: number;
  readonly minMm: number;
  readonly maxMm: number;
  readonly stepMm: number;
  readonly units: "mm" | "in";
  readonly hint?: string;
  readonly testId: string;
  /** While dragging or stepping: the new value and the input's time stamp. */
  readonly onLive: (mm: number, at: number) => void;
  /** When the drag ends or a typed value is entered. */
  readonly onCommit: (mm: number) => void;
}

/** A slider and a number field for one length, in the user's units; the slider works in mm steps. */
export function CutSlider({ label, valueMm, minMm, maxMm, stepMm, units, hint, testId, onLive, onCommit }: CutSliderProps) {
  const id = useId();
  const range = useRef<HTMLInputElement>(null);
  // While the field has focus it keeps what is typed; otherwise it shows the current value.
  const [typed, setTyped] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const text = typed ?? lengthFieldText(valueMm, units);

  const commitRef = useRef(onCommit);
  useEffect(() => {
    commitRef.current = onCommit;
  }, [onCommit]);
  useEffect(() => {
    const el = range.current;
    if (!el) return;
    // The native change event fires once when a drag ends (and per key step): that is when the value is saved.
    const onChange = () => commitRef.current(Number(el.value));
    el.addEventListener("change", onChange);
    return () => el.removeEventListener("change", onChange);
  }, []);

  const submit = () => {
    if (typed === null) return;
    const r = parseLengthText(text, units);
    if (!r.ok) return setError(`${r.message[0].toUpperCase()}${r.message.slice(1)}.`);
    if (r.value === undefined) return setError("Enter a number.");
    const mm = r.value;
    if (mm < minMm || mm > maxMm) return setError(`Enter a value from ${lengthLabel(minMm, units)} to ${lengthLabel(maxMm, units)}.`);
    setError(null);
    setTyped(null);
    onCommit(mm);
  };

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
          onChange={(e) => setTyped(e.target.value)}
          onBlur={submit}
          onKeyDown={(e) => {
            if (e.key === "Enter") submit();
          }}
        />
      </div>
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
}
