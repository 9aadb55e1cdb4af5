"use client";

import type { LengthUnits } from "@/geometry";
import { useFormContext, useWatch, type FieldValues, type Path } from "react-hook-form";
import { PairInputs } from "./pair-inputs";
import { PointsField } from "./points-field";
import { TextField } from "./text-field";

/** An outline in the deck plane: a circle (diameter, optional centre) or a polygon (its corners). */
export function OutlineField<FV extends FieldValues>({
  name,
  label,
  units,
  circleSlot,
}: {
  name: string;
  label: string;
  units: LengthUnits;
  /** Replaces the circle's diameter input (the mouth takes its diameter from readings). */
  circleSlot?: React.ReactNode;
}) {
  const { register, control } = useFormContext<FV>();
  const kind = useWatch({ control, name: `${name}.kind` as Path<FV> }) as string;
  return (
    <fieldset className="flex flex-col gap-3 rounded-md border border-rule p-4">
      <legend className="px-1 text-sm font-semibold">{label}</legend>
      <div className="flex gap-4 text-sm" role="radiogroup" aria-label={`${label} shape`}>
        <label className="flex items-center gap-2">
          <input type="radio" value="circle" {...register(`${name}.kind` as Path<FV>)} /> Circle
        </label>
        <label className="flex items-center gap-2">
          <input type="radio" value="polygon" {...register(`${name}.kind` as Path<FV>)} /> Polygon (corners)
        </label>
      </div>
      {kind === "polygon" ? (
        <PointsField name={`${name}.pointsMm`} units={units} label={label} />
      ) : (
        <div className="flex flex-wrap items-start gap-4">
          {circleSlot ?? <TextField<FV> name={`${name}.diameterMm` as Path<FV>} label="Diameter" unit={units} numeric className="w-40" />}
          <div>
            <span className="field-label">Centre (blank = on the axis)</span>
            <div className="mt-1">
              <PairInputs name={`${name}.centerMm`} label={`${label} centre`} units={units} />
            </div>
          </div>
        </div>
      )}
    </fieldset>
  );
}
