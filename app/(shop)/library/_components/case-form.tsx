"use client";

import { CaseProfileSchema, type LengthUnits } from "@/geometry";
import { FormProvider } from "react-hook-form";
import { FormNotice } from "../../../_ui/field";
import type { CaseRow } from "../../../_ui/query/types";
import { caseDefaults, caseToCore, type CaseFormValues } from "./case-values";
import { lengthText, parseLengthText } from "@/app/_ui/form/number-text";
import { OutlineField } from "@/app/_ui/form/outline-field";
import { PocketsField } from "@/app/_ui/form/pockets-field";
import { ReadingsField } from "@/app/_ui/form/readings-field";
import { SaveBar } from "@/app/_ui/form/save-bar";
import { StudsField } from "@/app/_ui/form/studs-field";
import { TextField } from "@/app/_ui/form/text-field";
import { UnitToggle } from "@/app/_ui/form/unit-toggle";
import { useLibraryForm } from "@/app/_ui/form/use-library-form";
import { FormSection } from "./form-section";
import { errorAt } from "@/app/_ui/form/field-error";

/** Create or edit a case profile: deck, mouth (read several times), studs, pockets, stock bore and stroke. */
export function CaseForm({ row, units: initialUnits }: { row: CaseRow | null; units: LengthUnits }) {
  const { form, units, setUnits, notice, onSubmit, busy } = useLibraryForm({
    kind: "cases",
    id: row?.id ?? null,
    version: row?.version ?? null,
    schema: CaseProfileSchema,
    initialUnits,
    defaults: caseDefaults(row, "mm"),
    toCore: caseToCore,
    toBody: (core, values: CaseFormValues, u) => {
      const { name, ...data } = core;
      const round = data.mouth.outline.kind === "circle";
      const readings = round
        ? values.mouthReadingsMm.map((t) => parseLengthText(t, u)).flatMap((r) => (r.ok && r.value !== undefined ? [Number(lengthText(r.value, "mm"))] : []))
        : [];
      return { name, notes: values.notes, data, ...(round ? { mouthReadingsMm: readings } : {}) };
    },
    fieldPath: (p) => p.replace(/^data\./, ""),
  });
  const errors = form.formState.errors;
  const stamps = (_v: number | undefined, i: number) => {
    const r = row?.mouthReadingsMm?.[i];
    return r ? { takenBy: r.takenBy.name, takenAt: r.takenAt } : undefined;
  };

  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-6" aria-label={row ? `Edit case profile ${row.name}` : "New case profile"}>
        <div className="flex flex-wrap items-center justify-between gap-3">
          <h1 className="text-2xl font-semibold">{row ? row.name : "New case profile"}</h1>
          <UnitToggle units={units} onChange={setUnits} />
        </div>
        {notice ? <FormNotice tone={notice.tone}>{notice.text}</FormNotice> : null}
        <FormSection title="Name">
          <TextField<CaseFormValues> name="name" label="Name" hint="Engine family and variant, e.g. “50 cc horizontal, four-stud”." className="md:col-span-2" />
          <TextField<CaseFormValues> name="notes" label="Notes" className="md:col-span-2" />
        </FormSection>
        <FormSection title="Mouth">
          <div className="md:col-span-2">
            <OutlineField<CaseFormValues>
              name="mouth.outline"
              label="Mouth opening"
              units={units}
              circleSlot={
                <div className="min-w-72">
                  <ReadingsField<CaseFormValues>
                    name="mouthReadingsMm"
                    label="Mouth diameter readings"
                    units={units}
                    counts="smallest"
                    stamps={stamps}
                    extraError={errorAt(errors, "mouth.outline.diameterMm")}
                    hint="Read the mouth with calipers at several angles; the smallest reading counts."
                  />
                </div>
              }
            />
          </div>
          <TextField<CaseFormValues> name="mouth.depthMm" label="Mouth depth before it opens into the crank chamber" unit={units} numeric />
        </FormSection>
        <FormSection title="Studs">
          <div className="md:col-span-2">
            <StudsField<CaseFormValues> units={units} />
          </div>
          <TextField<CaseFormValues> name="studHoleDiameterMm" label="Stud hole diameter" unit={units} numeric />
          <TextField<CaseFormValues> name="studThread" label="Stud thread" placeholder="M7 or M7x1" hint="ISO metric, optional." />
        </FormSection>
        <FormSection title="Deck outline">
          <div className="md:col-span-2">
            <OutlineField<CaseFormValues> name="deck" label="Deck outline" units={units} />
          </div>
        </FormSection>
        <FormSection title="Pockets">
          <div className="md:col-span-2">
            <PocketsField<CaseFormValues> units={units} />
          </div>
        </FormSection>
        <FormSection title="Engine">
          <TextField<CaseFormValues> name="stockBoreMm" label="Stock bore" unit={units} numeric />
          <TextField<CaseFormValues> name="strokeMm" label="Stroke" unit={units} numeric />
          <TextField<CaseFormValues> name="cylinders" label="Cylinders" numeric />
          <TextField<CaseFormValues> name="densityGPerCm3" label="Case alloy density" unit="g/cm³" numeric hint="Blank: 2.67 g/cm³, a common cast aluminium." />
        </FormSection>
        <SaveBar busy={busy} isNew={!row} backHref="/library?kind=cases" dirty={form.formState.isDirty} />
      </form>
    </FormProvider>
  );
}
