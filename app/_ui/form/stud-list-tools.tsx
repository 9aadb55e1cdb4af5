"use client";

import type { LengthUnits } from "@/geometry";
import { useState, type ReactNode } from "react";
import { parseLengthText } from "@/model/units";

/** The message a list field has as a whole (too few studs, a repeated label, too few corners), read out when it appears. */
export function ListError({ message }: { message: string | undefined }) {
  return message ? (
    <p role="alert" className="field-error">
      {message}
    </p>
  ) : null;
}

/**
 * Below a list of studs: add one, or fill a square pattern of four from its side (typed in the form's units).
 * `children` go on the same row (a "copy from" picker).
 */
export function StudListTools({ units, onAdd, onFillSquare, children }: { units: LengthUnits; onAdd: () => void; onFillSquare: (sideMm: number) => void; children?: ReactNode }) {
  const [side, setSide] = useState("");
  const sideMm = parseLengthText(side, units);
  return (
    <>
      <div className="flex flex-wrap items-end gap-3">
        <button type="button" className="btn-quiet" onClick={onAdd}>
          Add a stud
        </button>
        <label className="flex items-center gap-2 text-sm">
          <span className="text-ink-2">Square pattern, side</span>
          <input className="field-input mt-0 w-24 num" inputMode="decimal" value={side} onChange={(e) => setSide(e.target.value)} aria-label={`Square pattern side (${units})`} />
          <span className="text-ink-3 num">{units}</span>
        </label>
        <button type="button" className="btn-quiet" disabled={!sideMm.ok || !sideMm.value} onClick={() => sideMm.ok && sideMm.value && onFillSquare(sideMm.value)}>
          Fill four studs
        </button>
        {children}
      </div>
      {!sideMm.ok ? <p className="field-error">{sideMm.message}</p> : null}
    </>
  );
}
