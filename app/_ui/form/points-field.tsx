"use client";

import { useController, useFormContext, type FieldValues, type Path } from "react-hook-form";
import { CornerInputs } from "./corner-inputs";
import { ListError } from "./stud-list-tools";
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
              <CornerInputs label={label} index={i} point={p} units={units} errors={[ex, ey]} onEdit={(axis, text) => edit(i, axis, text)} onRemove={() => set(points.filter((_, j) => j !== i))} onBlur={field.onBlur} />
            </li>
          );
        })}
      </ol>
      <div>
        <button type="button" className="btn-quiet" onClick={() => set([...points, ["", ""]])}>
          Add a corner
        </button>
      </div>
      <ListError message={err} />
    </div>
  );
}
