"use client";

import type { LengthUnits } from "@/geometry";
import { useFieldArray, useFormContext } from "react-hook-form";
import { errorAt } from "@/app/_ui/form/field-error";
import { TextField } from "@/app/_ui/form/text-field";
import type { RigFormValues } from "./rig-values";

/** The shaft's stop grooves: travel with the ring in each, measured with the bit resting on the deck. */
export function GroovesField({ units }: { units: LengthUnits }) {
  const { control, formState } = useFormContext<RigFormValues>();
  const { fields, append, remove } = useFieldArray({ control, name: "grooves" });
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="field-label">Stop grooves</legend>
      {fields.map((f, i) => (
        <div key={f.id} className="flex flex-wrap items-end gap-3">
          <TextField<RigFormValues> name={`grooves.${i}.label`} label="Label" className="w-36" />
          <TextField<RigFormValues> name={`grooves.${i}.travelMm`} label="Travel" unit={units} numeric className="w-32" />
          <button type="button" className="btn-quiet mb-0.5" onClick={() => remove(i)}>
            Remove
          </button>
        </div>
      ))}
      {errorAt(formState.errors, "grooves") ? <p className="field-error">{errorAt(formState.errors, "grooves")}</p> : null}
      <div>
        <button type="button" className="btn-quiet" onClick={() => append({ label: `groove ${fields.length + 1}`, travelMm: "" })}>
          Add a groove
        </button>
      </div>
    </fieldset>
  );
}

/** The shims and washers at hand for the depth stop: a thickness and how many. */
export function ShimsField({ units }: { units: LengthUnits }) {
  const { control } = useFormContext<RigFormValues>();
  const { fields, append, remove } = useFieldArray({ control, name: "shims" });
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="field-label">Shims and washers at hand</legend>
      {fields.length === 0 ? <p className="text-sm text-ink-2">None: the depth is set by the grooves alone.</p> : null}
      {fields.map((f, i) => (
        <div key={f.id} className="flex flex-wrap items-end gap-3">
          <TextField<RigFormValues> name={`shims.${i}.thicknessMm`} label="Thickness" unit={units} numeric className="w-32" />
          <TextField<RigFormValues> name={`shims.${i}.count`} label="How many" numeric className="w-24" />
          <button type="button" className="btn-quiet mb-0.5" onClick={() => remove(i)}>
            Remove
          </button>
        </div>
      ))}
      <div>
        <button type="button" className="btn-quiet" onClick={() => append({ thicknessMm: "", count: "1" })}>
          Add shims
        </button>
      </div>
    </fieldset>
  );
}
