"use client";

import { useController, useFormContext, type FieldValues, type Path } from "react-hook-form";
import { errorAt } from "./field-error";
import type { PairText } from "./text-values";

/** A polygon's corners as an editable list of points, in order around the outline. */
export function PointsField<FV extends FieldValues>({ name, units, label }: { name: string; units: string; label: string }) {
  const { control, formState } = useFormContext<FV>();
  const { field } = useController({ control, name: name as Path<FV> });
  const points = (field.value as PairText[] | undefined) ?? [];
  const set = (next: PairText[]) => field.onChange(next);
  const edit = (i: number, axis: 0 | 1, text: string) => set(points.map((p, j) => (j === i ? (axis === 0 ? [text, p[1]] : [p[0], text]) : p)));
  const err = errorAt(formState.errors, name);
  return (
    <div className="flex flex-col gap-2">
      <ol className="flex flex-col gap-1">
        {points.map((p, i) => {
          const ex = errorAt(formState.errors, `${name}.${i}.0`);
          const ey = errorAt(formState.errors, `${name}.${i}.1`);
          return (
            <li key={i} className="flex flex-col">
              <div className="flex flex-wrap items-center gap-2">
                <span className="w-10 text-sm text-ink-3 num">#{i + 1}</span>
                {([0, 1] as const).map((axis) => (
                  <label key={axis} className="flex items-center gap-1 text-sm text-ink-2">
                    <span className="num">{axis === 0 ? "x" : "y"}</span>
                    <input
                      aria-label={`${label} corner ${i + 1} ${axis === 0 ? "x" : "y"} (${units})`}
                      className="field-input mt-0 w-24 num"
                      inputMode="decimal"
                      autoComplete="off"
                      value={p[axis]}
                      aria-invalid={(axis === 0 ? ex : ey) ? true : undefined}
                      onChange={(e) => edit(i, axis, e.target.value)}
                      onBlur={field.onBlur}
                    />
                  </label>
                ))}
                <span className="text-sm text-ink-3 num">{units}</span>
                <button type="button" className="btn-quiet" onClick={() => set(points.filter((_, j) => j !== i))} aria-label={`Remove ${label} corner ${i + 1}`}>
                  Remove
                </button>
              </div>
              {ex || ey ? (
                <p role="alert" className="field-error ml-12">
                  {[ex && `x: ${ex}`, ey && `y: ${ey}`].filter(Boolean).join(" · ")}
                </p>
              ) : null}
            </li>
          );
        })}
      </ol>
      <div>
        <button type="button" className="btn-quiet" onClick={() => set([...points, ["", ""]])}>
          Add a corner
        </button>
      </div>
      {err ? (
        <p role="alert" className="field-error">
          {err}
        </p>
      ) : null}
    </div>
  );
}
