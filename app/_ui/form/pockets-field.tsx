"use client";

import type { LengthUnits } from "@/geometry";
import { useFieldArray, useFormContext, type ArrayPath, type FieldValues, type Path } from "react-hook-form";
import { OutlineField } from "./outline-field";
import { emptyOutline } from "./text-values";
import { TextField } from "./text-field";

/** Transfer passages and other cavities near the mouth, each an outline and the depth where it starts. */
export function PocketsField<FV extends FieldValues>({ units }: { units: LengthUnits }) {
  const { control } = useFormContext<FV>();
  const { fields, append, remove } = useFieldArray({ control, name: "pockets" as ArrayPath<FV> });
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="field-label">Pockets (transfer passages, cavities near the mouth)</legend>
      {fields.length === 0 ? <p className="text-sm text-ink-2">None yet. Add the transfer passages so the cut keeps its wall to them.</p> : null}
      {fields.map((f, i) => (
        <div key={f.id} className="flex flex-col gap-3 rounded-md bg-paper-2/50 p-3">
          <div className="flex flex-wrap items-end gap-4">
            <TextField<FV> name={`pockets.${i}.label` as Path<FV>} label="Label" className="w-56" />
            <TextField<FV> name={`pockets.${i}.startDepthMm` as Path<FV>} label="Starts below the deck" unit={units} numeric className="w-44" />
            <button type="button" className="btn-quiet" onClick={() => remove(i)}>
              Remove pocket
            </button>
          </div>
          <OutlineField<FV> name={`pockets.${i}.outline`} label={`Pocket ${i + 1} outline`} units={units} />
        </div>
      ))}
      <div>
        <button
          type="button"
          className="btn-quiet"
          onClick={() => append({ label: `passage ${fields.length + 1}`, startDepthMm: "0", outline: emptyOutline("polygon") } as never)}
        >
          Add a pocket
        </button>
      </div>
    </fieldset>
  );
}
