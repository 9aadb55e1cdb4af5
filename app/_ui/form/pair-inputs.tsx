"use client";

import { useFormContext, type FieldValues, type Path } from "react-hook-form";
import { errorAt } from "./field-error";

/** Two registered inputs for a point [x, y], with the message of whichever is wrong. */
export function PairInputs<FV extends FieldValues>({ name, label, units }: { name: string; label: string; units: string }) {
  const { register, formState } = useFormContext<FV>();
  const ex = errorAt(formState.errors, `${name}.0`);
  const ey = errorAt(formState.errors, `${name}.1`);
  const id = `f-${name.replaceAll(".", "-")}`;
  return (
    <div className="flex flex-col">
      <div className="flex items-center gap-2">
        {(["x", "y"] as const).map((axis, i) => (
          <label key={axis} className="flex items-center gap-1 text-sm text-ink-2">
            <span className="num">{axis}</span>
            <input
              id={`${id}-${i}`}
              aria-label={`${label} ${axis} (${units})`}
              className="field-input mt-0 w-24 num"
              inputMode="decimal"
              autoComplete="off"
              aria-invalid={(i === 0 ? ex : ey) ? true : undefined}
              {...register(`${name}.${i}` as Path<FV>)}
            />
          </label>
        ))}
        <span className="text-sm text-ink-3 num">{units}</span>
      </div>
      {ex || ey ? (
        <p role="alert" className="field-error">
          {ex ? `x: ${ex}` : ""}
          {ex && ey ? " · " : ""}
          {ey ? `y: ${ey}` : ""}
        </p>
      ) : null}
    </div>
  );
}
