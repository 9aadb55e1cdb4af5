"use client";

import type { LengthUnits } from "@/geometry";

/**
 * mm / in as two pressed-or-not buttons. A form's lengths (switching converts what was typed, nothing is lost),
 * or the person's own preference in the header (`label` and `compact` there).
 */
export function UnitToggle({
  units,
  onChange,
  label = "Units of this form",
  disabled,
  compact = false,
}: {
  units: LengthUnits;
  onChange: (u: LengthUnits) => void;
  label?: string;
  disabled?: boolean;
  /** The header's smaller buttons, in the header's own text size. */
  compact?: boolean;
}) {
  return (
    <div role="group" aria-label={label} className={`inline-flex overflow-hidden rounded-md border border-rule ${compact ? "" : "text-sm"}`}>
      {(["mm", "in"] as const).map((u) => (
        <button
          key={u}
          type="button"
          aria-pressed={units === u}
          disabled={disabled}
          onClick={() => units !== u && onChange(u)}
          className={`${compact ? "px-2.5" : "px-3"} py-1 num ${units === u ? "bg-accent text-paper" : "bg-card text-ink-2 hover:text-ink"}`}
        >
          {u}
        </button>
      ))}
    </div>
  );
}
