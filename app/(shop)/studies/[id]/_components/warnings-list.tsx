import type { Warning } from "@/geometry";
import { messageInUnits, type LengthUnits } from "@/model/units";

/** The core's warnings in its own plain words, every figure in the user's units. */
export function WarningsList({ warnings, units }: { warnings: Warning[]; units: LengthUnits }) {
  if (warnings.length === 0) return <p className="text-sm text-clear">No warnings.</p>;
  return (
    <ul className="flex flex-col gap-1" aria-label="Warnings" data-testid="warnings">
      {warnings.map((w, i) => (
        <li key={`${w.code}-${i}`} className="rounded-md border-l-4 border-tight bg-tight-soft px-3 py-1.5 text-sm">
          {messageInUnits(w.message, units)}
        </li>
      ))}
    </ul>
  );
}
