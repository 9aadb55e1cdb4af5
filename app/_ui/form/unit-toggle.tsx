"use client";

import type { LengthUnits } from "@/geometry";

/** mm / in for the lengths of one form; switching converts what was typed, nothing is lost. */
export function UnitToggle({ units, onChange }: { units: LengthUnits; onChange: (u: LengthUnits) => void }) {
  return (
    <div role="group" aria-label="Units of this form" className="inline-flex overflow-hidden rounded-md border border-rule text-sm">
      {(["mm", "in"] as const).map((u) => (
        <button
          key={u}
          type="button"
          aria-pressed={units === u}
          onClick={() => units !== u && onChange(u)}
          className={`px-3 py-1 num ${units === u ? "bg-accent text-paper" : "bg-card text-ink-2 hover:text-ink"}`}
        >
          {u}
        </button>
      ))}
    </div>
  );
}
