"use client";

import type { PairText } from "./text-values";

/** The messages of a point's two inputs on one line ("x: … · y: …"), or nothing when both are right. */
export function AxisErrors({ x, y, className = "" }: { x: string | undefined; y: string | undefined; className?: string }) {
  return x || y ? (
    <p role="alert" className={`field-error ${className}`.trim()}>
      {[x && `x: ${x}`, y && `y: ${y}`].filter(Boolean).join(" · ")}
    </p>
  ) : null;
}

/** One corner of a polygon outline: its number, x and y in the form's units, a remove button and the corner's messages. */
export function CornerInputs({
  label,
  index,
  point,
  units,
  errors,
  onEdit,
  onRemove,
  onBlur,
}: {
  /** The outline's name, as the inputs' names start ("Deck"). */
  label: string;
  index: number;
  point: PairText;
  units: string;
  errors: [x: string | undefined, y: string | undefined];
  onEdit: (axis: 0 | 1, text: string) => void;
  onRemove: () => void;
  onBlur?: () => void;
}) {
  return (
    <>
      <div className="flex flex-wrap items-center gap-2">
        <span className="w-10 text-sm text-ink-3 num">#{index + 1}</span>
        {([0, 1] as const).map((axis) => (
          <label key={axis} className="flex items-center gap-1 text-sm text-ink-2">
            <span className="num">{axis ? "y" : "x"}</span>
            <input
              aria-label={`${label} corner ${index + 1} ${axis ? "y" : "x"} (${units})`}
              className="field-input mt-0 w-24 num"
              inputMode="decimal"
              autoComplete="off"
              value={point[axis]}
              aria-invalid={errors[axis] ? true : undefined}
              onChange={(e) => onEdit(axis, e.target.value)}
              onBlur={onBlur}
            />
          </label>
        ))}
        <span className="text-sm text-ink-3 num">{units}</span>
        <button type="button" className="btn-quiet" onClick={onRemove} aria-label={`Remove ${label} corner ${index + 1}`}>
          Remove
        </button>
      </div>
      <AxisErrors x={errors[0]} y={errors[1]} className="ml-12" />
    </>
  );
}
