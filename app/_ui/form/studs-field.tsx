"use client";

import type { LengthUnits } from "@/geometry";
import { useFieldArray, useFormContext, type ArrayPath, type FieldValues } from "react-hook-form";
import { errorAt } from "./field-error";
import { lengthFieldText } from "@/model/units";
import { PairInputs } from "./pair-inputs";
import { ListError, StudListTools } from "./stud-list-tools";
import type { StudText } from "./text-values";

const SQUARE = [
  ["front left", -1, 1],
  ["front right", 1, 1],
  ["rear right", 1, -1],
  ["rear left", -1, -1],
] as const;

/** The studs as an editable list (label and position from the cylinder axis), with a square-pattern filler. */
export function StudsField<FV extends FieldValues>({ units, copyFrom }: { units: LengthUnits; copyFrom?: React.ReactNode }) {
  const { control, formState, register } = useFormContext<FV>();
  const { fields, append, remove, replace } = useFieldArray({ control, name: "studs" as ArrayPath<FV> });
  const fillSquare = (sideMm: number) => {
    const h = lengthFieldText(sideMm / 2, units);
    const neg = lengthFieldText(-sideMm / 2, units);
    replace(SQUARE.map(([label, sx, sy]) => ({ label, positionMm: [sx < 0 ? neg : h, sy < 0 ? neg : h] }) satisfies StudText) as never);
  };
  const listError = errorAt(formState.errors, "studs");
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="field-label">Studs (position from the cylinder axis at the deck)</legend>
      <ul className="flex flex-col gap-2">
        {fields.map((f, i) => {
          const labelErr = errorAt(formState.errors, `studs.${i}.label`);
          return (
            <li key={f.id} className="flex flex-wrap items-start gap-3">
              <div className="flex flex-col">
                <input
                  aria-label={`Stud ${i + 1} label`}
                  className="field-input mt-0 w-36"
                  autoComplete="off"
                  aria-invalid={labelErr ? true : undefined}
                  {...register(`studs.${i}.label` as never)}
                />
                {labelErr ? (
                  <p role="alert" className="field-error">
                    {labelErr}
                  </p>
                ) : null}
              </div>
              <PairInputs name={`studs.${i}.positionMm`} label={`Stud ${i + 1}`} units={units} />
              <button type="button" className="btn-quiet" onClick={() => remove(i)} aria-label={`Remove stud ${i + 1}`}>
                Remove
              </button>
            </li>
          );
        })}
      </ul>
      <ListError message={listError} />
      <StudListTools units={units} onAdd={() => append({ label: `stud ${fields.length + 1}`, positionMm: ["", ""] } as never)} onFillSquare={fillSquare}>
        {copyFrom}
      </StudListTools>
    </fieldset>
  );
}
