"use client";

import { BoringRigSchema, type LengthUnits } from "@/geometry";
import { FormProvider } from "react-hook-form";
import type { RigRow } from "../../../_ui/query/types";
import { FormSection } from "./form-section";
import { SaveBar } from "@/app/_ui/form/save-bar";
import { TextField } from "@/app/_ui/form/text-field";
import { FormHeading } from "@/app/_ui/form/form-heading";
import { useLibraryForm } from "@/app/_ui/form/use-library-form";
import { GroovesField, ShimsField } from "./rig-lists";
import { rigDefaults, rigToCore, type RigFormValues } from "./rig-values";

/** Create or edit a boring rig: head, bit and its calibrated reach, hardware, stop grooves, shims, drill. */
export function RigForm({ row, units: initialUnits }: { row: RigRow | null; units: LengthUnits }) {
  const { form, units, setUnits, notice, onSubmit, busy } = useLibraryForm({
    kind: "rigs",
    row,
    schema: BoringRigSchema,
    initialUnits,
    defaults: rigDefaults(row, "mm"),
    toCore: rigToCore,
    toBody: (core, values: RigFormValues) => {
      const { name, ...data } = core;
      return { name, notes: values.notes, data };
    },
  });
  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-6" aria-label={row ? `Edit rig ${row.name}` : "New boring rig"}>
        <FormHeading title={row ? row.name : "New boring rig"} units={units} onUnits={setUnits} notice={notice} />
        <FormSection title="Rig">
          <TextField<RigFormValues> name="name" label="Name" className="md:col-span-2" />
          <TextField<RigFormValues> name="headDiameterMm" label="Cutter head diameter, as measured (without the bit)" unit={units} numeric />
          <TextField<RigFormValues> name="hardwareRadiusMm" label="Radius of the outermost screw heads" unit={units} numeric hint="From the shaft axis; optional." />
          <TextField<RigFormValues> name="settingResolutionMm" label="Setting read to" unit={units} numeric hint="Blank: 0.05 mm, a caliper." />
          <TextField<RigFormValues> name="studThread" label="Holder stud thread" placeholder="M7x1" />
          <TextField<RigFormValues> name="notes" label="Notes" className="md:col-span-2" />
        </FormSection>
        <FormSection title="Bit">
          <TextField<RigFormValues> name="bitLengthMm" label="Length of the bit installed now" unit={units} numeric />
          <div />
          <TextField<RigFormValues> name="calibration.bitLengthMm" label="Calibrated with a bit of length" unit={units} numeric />
          <div className="grid grid-cols-2 gap-3">
            <TextField<RigFormValues> name="calibration.minCutDiameterMm" label="Smallest cut it gave" unit={units} numeric />
            <TextField<RigFormValues> name="calibration.maxCutDiameterMm" label="Largest cut it gave" unit={units} numeric />
          </div>
        </FormSection>
        <FormSection title="Depth stop and drill">
          <GroovesField units={units} />
          <ShimsField units={units} />
          <TextField<RigFormValues> name="drillTopRpm" label="Drill top speed" unit="rpm" numeric />
        </FormSection>
        <SaveBar busy={busy} isNew={!row} backHref="/library?kind=rigs" dirty={form.formState.isDirty} />
      </form>
    </FormProvider>
  );
}
