"use client";

import type { LengthUnits } from "@/geometry";
import { KitFormSchema } from "@/model/schemas";
import { useRef } from "react";
import { FormProvider, useFormContext } from "react-hook-form";
import type { KitRow } from "../../../_ui/query/types";
import { CopyStudsFromCase } from "./copy-studs";
import { FormSection } from "./form-section";
import { ReadingsField } from "@/app/_ui/form/readings-field";
import { SaveBar } from "@/app/_ui/form/save-bar";
import { StudsField } from "@/app/_ui/form/studs-field";
import { TextField } from "@/app/_ui/form/text-field";
import { FormHeading } from "@/app/_ui/form/form-heading";
import { useLibraryForm } from "@/app/_ui/form/use-library-form";
import { READING_LISTS } from "./reading-lists";
import { kitDefaults, kitDoc, kitToCore, mergeKit, type KitFormValues } from "./kit-values";
import { GasketSection } from "./shapes/gasket-section";
import { useShapeForm } from "./shapes/use-shape-form";
import { useShapeValidation } from "./shapes/use-shape-validation";

/** Half the last digit of a length shown in inches (0.0001 in): a reading shown in inches still finds its stamp. */
const INCH_TEXT_MM = 0.0013;

/** The skirt's two lists of readings, each stamped with who took its readings and when. */
const SKIRT_READINGS = ["skirtDiameter", "skirtLength"] as const;

/** Create or edit a cylinder kit: bore, skirt readings (the largest counts), studs, gaskets and the base gasket's ports, price. */
export function KitForm({ row, units: initialUnits }: { row: KitRow | null; units: LengthUnits }) {
  const { store, outside, shapesDirty } = useShapeForm<KitFormValues>(() => kitDoc(row), initialUnits, mergeKit);
  const { form, units, setUnits, notice, onSubmit, busy } = useLibraryForm({
    kind: "kits",
    row,
    schema: KitFormSchema,
    initialUnits,
    defaults: kitDefaults(row, "mm"),
    toCore: kitToCore,
    toBody: (core, values: KitFormValues) => {
      const { id: _id, name, ...data } = core;
      void _id;
      return { name, notes: values.notes, data };
    },
    outside,
  });
  const scope = useRef<HTMLFormElement>(null);
  const validate = useShapeValidation(store, form);
  const stamp = (list: KitRow["readings"]["skirtDiameter"] | undefined) => (v: number | undefined) => {
    const r = v === undefined ? undefined : list?.find((x) => Math.abs(x.valueMm - v) < INCH_TEXT_MM);
    return r ? { takenBy: r.takenBy.name, takenAt: r.takenAt } : undefined;
  };

  return (
    <FormProvider {...form}>
      <form ref={scope} onSubmit={onSubmit} noValidate className="flex flex-col gap-6" aria-label={row ? `Edit kit ${row.name}` : "New cylinder kit"}>
        <FormHeading title={row ? row.name : "New cylinder kit"} units={units} onUnits={setUnits} notice={notice} />
        <FormSection title="Kit">
          <TextField<KitFormValues> name="name" label="Name" className="md:col-span-2" />
          <TextField<KitFormValues> name="boreMm" label="Bore" unit={units} numeric />
          <TextField<KitFormValues> name="strokeMm" label="Stroke (only with a stroker crank)" unit={units} numeric hint="Blank: the case's stroke." />
          <TextField<KitFormValues> name="price" label="Price" numeric hint="Before tax, optional; it becomes the kit line of a job's quote." />
          <TextField<KitFormValues> name="priceCurrency" label="Price currency" hint="ISO 4217 code, e.g. EUR." />
          <TextField<KitFormValues> name="notes" label="Notes" />
        </FormSection>
        <FormSection title="Skirt, as measured">
          {SKIRT_READINGS.map((reading) => (
            <ReadingsField<KitFormValues> key={reading} {...READING_LISTS[reading]} units={units} stamps={stamp(row?.readings?.[reading])} />
          ))}
        </FormSection>
        <FormSection title="Studs the kit needs">
          <div className="md:col-span-2">
            <StudsField<KitFormValues> units={units} copyFrom={<CopyStudsFromCase units={units} />} />
          </div>
          <TextField<KitFormValues> name="studThread" label="Stud thread" placeholder="M7 or M7x1" hint="ISO metric, optional." />
        </FormSection>
        <FormSection title="Base gaskets">
          <ReadingsField<KitFormValues> {...READING_LISTS.baseGaskets} units={units} />
          <GasketSwitch />
        </FormSection>
        <GasketSection store={store} units={units} scope={scope} onCommit={validate} />
        <SaveBar busy={busy} isNew={!row} backHref="/library?kind=kits" dirty={form.formState.isDirty || shapesDirty} />
      </form>
    </FormProvider>
  );
}

function GasketSwitch() {
  const { register } = useFormContext<KitFormValues>();
  return (
    <label className="flex items-start gap-2 text-sm">
      <input type="checkbox" className="mt-1" {...register("alwaysWithGasket")} />
      <span>
        Always run with a base gasket
        <span className="field-hint block">Then the thinnest gasket is taken off the skirt&apos;s protrusion. Leave it off when the kit may run without one.</span>
      </span>
    </label>
  );
}
