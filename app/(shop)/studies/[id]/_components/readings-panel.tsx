"use client";

import type { LengthUnits } from "@/geometry";
import { useFieldArray, useFormContext } from "react-hook-form";
import { errorAt } from "@/app/_ui/form/field-error";
import { TextField } from "@/app/_ui/form/text-field";
import { STRAIGHTEDGE_HINT, TERM } from "@/model/glossary";
import type { StudyFormValues } from "./study-values";

/** The holder's height above the deck at each stud, as read (plus a straightedge where the deck is not under the gauge). */
export function ReadingsPanel({ units, studs }: { units: LengthUnits; studs: string[] }) {
  const { control, register, formState } = useFormContext<StudyFormValues>();
  const { fields, append, remove } = useFieldArray({ control, name: "readings.holderHeights" });
  const missing = studs.filter((s) => !fields.some((f) => f.stud === s));
  return (
    <section className="card flex flex-col gap-3 p-4" aria-label="Holder heights">
      <h2 className="font-semibold">Holder heights</h2>
      <p className="text-sm text-ink-2">Height of the holder plate above the deck at each stud, read with a depth gauge. Three or more give the tilt. {STRAIGHTEDGE_HINT}</p>
      {fields.map((f, i) => {
        const studErr = errorAt(formState.errors, `readings.holderHeights.${i}.stud`);
        return (
          <div key={f.id} className="flex flex-wrap items-end gap-2 border-b border-rule pb-2 last:border-0">
            <label className="block">
              <span className="field-label">At stud</span>
              <select className="field-input w-36" defaultValue={f.stud} {...register(`readings.holderHeights.${i}.stud`)}>
                {[...new Set([f.stud, ...studs])].map((s) => (
                  <option key={s} value={s}>
                    {s}
                  </option>
                ))}
              </select>
              {studErr ? <p className="field-error">{studErr}</p> : null}
            </label>
            <TextField<StudyFormValues> name={`readings.holderHeights.${i}.heightMm`} label={TERM.holderHeight.short} unit={units} numeric className="w-28" />
            <TextField<StudyFormValues> name={`readings.holderHeights.${i}.straightedgeMm`} label={TERM.straightedge.label} unit={units} numeric className="w-36" />
            <button type="button" className="btn-quiet mb-0.5" onClick={() => remove(i)} aria-label={`Remove the reading at ${f.stud}`}>
              Remove
            </button>
          </div>
        );
      })}
      {missing.length ? (
        <div>
          <button type="button" className="btn-quiet" onClick={() => append(missing.map((stud) => ({ stud, heightMm: "", straightedgeMm: "" })))}>
            {fields.length ? "Add the remaining studs" : "Add a reading at every stud"}
          </button>
        </div>
      ) : null}
    </section>
  );
}
