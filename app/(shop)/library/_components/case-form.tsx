"use client";

import { CaseProfileSchema, type LengthUnits } from "@/geometry";
import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import { FormProvider, useFormContext, useWatch } from "react-hook-form";
import { FormNotice } from "../../../_ui/field";
import type { CaseRow } from "../../../_ui/query/types";
import { caseDefaults, caseDoc, caseFieldDefaults, caseToCore, mergeCase, type CaseFormValues } from "./case-values";
import { errorAt } from "@/app/_ui/form/field-error";
import { lengthFieldText as lengthText, lengthLabel, parseLengthText } from "@/model/units";
import { ReadingsField } from "@/app/_ui/form/readings-field";
import { SaveBar } from "@/app/_ui/form/save-bar";
import { TextField } from "@/app/_ui/form/text-field";
import { FormHeading } from "@/app/_ui/form/form-heading";
import { useLibraryForm } from "@/app/_ui/form/use-library-form";
import type { PhotoReference } from "@/app/_ui/capture/captured-shapes";
import type { ChosenPhoto } from "@/app/_ui/capture/photo-trace";
import { CasePhotoContext, keepCasePhoto, keepReference, latestCasePhoto, leaveNoticeFor, sameReference, takeNoticeFor, type CasePhotoLink } from "./case-photo";
import { FormSection } from "./form-section";
import { READING_LISTS } from "./reading-lists";
import { CasePlan } from "./shapes/case-plan";
import { MEASURES } from "./shapes/measure-panel";
import { StorePocketsField, StoreStudsField } from "./shapes/store-lists";
import { StoreOutlineField } from "./shapes/store-outline-field";
import type { ShapeStore } from "./shapes/shape-store";
import { useShapeForm } from "./shapes/use-shape-form";
import { useShapeValidation } from "./shapes/use-shape-validation";

/**
 * Create or edit a case profile: deck, mouth (read several times), studs, passages, stock bore and
 * stroke, with the plan at the deck drawn beside the fields. The shapes live in a shape store (with
 * undo); react-hook-form keeps the other fields; validation and saving read both.
 */
export function CaseForm({ row, units: initialUnits }: { row: CaseRow | null; units: LengthUnits }) {
  const [first] = useState(() => caseDefaults(row, "mm"));
  const { store, outside, shapesDirty } = useShapeForm<CaseFormValues>(() => caseDoc(first, row), initialUnits, mergeCase);
  const photo = useCasePhoto(row);
  const { form, units, setUnits, notice, onSubmit, busy } = useLibraryForm({
    kind: "cases",
    row,
    schema: CaseProfileSchema,
    initialUnits,
    defaults: caseFieldDefaults(first) as CaseFormValues,
    toCore: caseToCore,
    toBody: (core, values: CaseFormValues, u) => {
      const { name, ...data } = core;
      const round = data.mouth.outline.kind === "circle";
      const readings = round
        ? values.mouthReadingsMm.map((t) => parseLengthText(t, u)).flatMap((r) => (r.ok && r.value !== undefined ? [Number(lengthText(r.value, "mm"))] : []))
        : [];
      return { name, notes: values.notes, data, ...(round ? { mouthReadingsMm: readings } : {}) };
    },
    outside,
    afterSave: photo.afterSave,
  });
  const scope = useRef<HTMLFormElement>(null);
  const validate = useShapeValidation(store, form);
  const stamps = (_v: number | undefined, i: number) => {
    const r = row?.mouthReadingsMm?.[i];
    return r ? { takenBy: r.takenBy.name, takenAt: r.takenAt } : undefined;
  };

  return (
    <FormProvider {...form}>
      <form ref={scope} onSubmit={onSubmit} noValidate className="flex flex-col gap-6" aria-label={row ? `Edit case profile ${row.name}` : "New case profile"}>
        <FormHeading title={row ? row.name : "New case profile"} units={units} onUnits={setUnits} notice={notice} />
        {photo.notice && !notice ? <FormNotice tone="error">{photo.notice}</FormNotice> : null}
        <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
          <div className="flex min-w-0 flex-col gap-6">
            <CaseFields store={store} units={units} stamps={stamps} />
          </div>
          <div className="min-w-0">
            <CasePhotoContext.Provider value={photo.link}>
              <CasePlan store={store} units={units} scope={scope} onCommit={validate} caseId={row?.id ?? null} />
            </CasePhotoContext.Provider>
            <CrankLine units={units} />
          </div>
        </div>
        <SaveBar busy={busy} isNew={!row} backHref="/library?kind=cases" dirty={form.formState.isDirty || shapesDirty || photo.dirty} />
      </form>
    </FormProvider>
  );
}

type Stamp = { takenBy: string; takenAt: string } | undefined;

/** The fields of a case profile, section by section: the shapes from the shape store, the rest from the form. */
function CaseFields({ store, units, stamps }: { store: ShapeStore; units: LengthUnits; stamps: (v: number | undefined, i: number) => Stamp }) {
  const errors = useFormContext<CaseFormValues>().formState.errors;
  return (
    <>
      <FormSection title="Name">
        <TextField<CaseFormValues> name="name" label="Name" hint="Engine family and variant, e.g. “50 cc horizontal, four-stud”." className="md:col-span-2" />
        <TextField<CaseFormValues> name="notes" label="Notes" className="md:col-span-2" />
      </FormSection>
      <FormSection title="Deck outline">
        <div className="md:col-span-2">
          <StoreOutlineField store={store} shapeKey="deck" path="deck" label="Deck" measures={MEASURES.deck} mirror="flip" />
        </div>
      </FormSection>
      <FormSection title="Mouth">
        <div className="md:col-span-2">
          <StoreOutlineField
            store={store}
            shapeKey="mouth"
            path="mouth.outline"
            label="Mouth opening"
            circleSlot={
              <div className="min-w-72">
                <ReadingsField<CaseFormValues> {...READING_LISTS.mouth} units={units} stamps={stamps} extraError={errorAt(errors, "mouth.outline.diameterMm")} />
              </div>
            }
          />
        </div>
        <TextField<CaseFormValues> name="mouth.depthMm" label="Mouth depth before it opens into the crank chamber" unit={units} numeric />
      </FormSection>
      <FormSection title="Studs">
        <div className="md:col-span-2">
          <StoreStudsField store={store} />
        </div>
        <TextField<CaseFormValues> name="studHoleDiameterMm" label="Stud hole diameter" unit={units} numeric />
        <TextField<CaseFormValues> name="studThread" label="Stud thread" placeholder="M7 or M7x1" hint="ISO metric, optional." />
      </FormSection>
      <FormSection title="Transfer passages and pockets">
        <div className="md:col-span-2">
          <StorePocketsField store={store} word="passage" />
        </div>
      </FormSection>
      <FormSection title="Engine">
        <TextField<CaseFormValues> name="stockBoreMm" label="Stock bore" unit={units} numeric />
        <TextField<CaseFormValues> name="strokeMm" label="Stroke" unit={units} numeric />
        <TextField<CaseFormValues> name="cylinders" label="Cylinders" numeric />
        <TextField<CaseFormValues> name="densityGPerCm3" label="Case alloy density" unit="g/cm³" numeric hint="Blank: 2.67 g/cm³, a common cast aluminium." />
      </FormSection>
      <FormSection title="Crank chamber (optional)">
        <p className="text-sm text-ink-2 md:col-span-2">
          With all three lengths the study checks how close the skirt comes to the crank webs; leave all three empty to skip that check.
        </p>
        <TextField<CaseFormValues> name="crank.deckToAxisMm" label="Deck to crank axis" unit={units} numeric hint="From the deck face down to the crankshaft's centre line." />
        <TextField<CaseFormValues> name="crank.webRadiusMm" label="Crank web radius" unit={units} numeric hint="Outer radius of the webs about the crank axis." />
        <TextField<CaseFormValues> name="crank.webSpanMm" label="Crank web span" unit={units} numeric hint="Across both webs along the crank axis, outer face to outer face." />
      </FormSection>
    </>
  );
}

/**
 * The deck photo's part of the case form: a photo chosen before the first save is kept right after it;
 * the reference points are restored from the kept photo and saved with it at each save. When keeping
 * fails the case stays saved and the form says what was not kept and why.
 */
function useCasePhoto(row: CaseRow | null) {
  const caseId = row?.id ?? null;
  const chosen = useRef<ChosenPhoto | null>(null);
  const reference = useRef<PhotoReference | null>(null);
  const kept = useRef<PhotoReference | null>(null);
  const [dirty, setDirty] = useState(false);
  const [initialReference, setInitialReference] = useState<PhotoReference | undefined>(undefined);
  const [notice, setNotice] = useState<string | null>(null);

  useEffect(() => {
    if (!caseId) return;
    let live = true;
    // A note the first save left (the photo it could not keep) is shown once, with what the store says now.
    const left = takeNoticeFor(caseId);
    void latestCasePhoto(caseId).then((r) => {
      if (!live) return;
      if (left) setNotice(left);
      if (!r.ok) setNotice(`The kept photo's reference points could not be read: ${r.message}`);
      else if (r.photo?.reference) {
        kept.current = r.photo.reference;
        reference.current = r.photo.reference;
        setInitialReference(r.photo.reference);
      }
    });
    return () => {
      live = false;
    };
  }, [caseId]);

  const onReferenceChange = useCallback((ref: PhotoReference | null) => {
    reference.current = ref;
    setDirty(!sameReference(ref, kept.current));
  }, []);
  const onPhotoChosen = useCallback((p: ChosenPhoto) => {
    chosen.current = p;
    setDirty(true);
  }, []);
  const link = useMemo<CasePhotoLink>(() => ({ initialReference, onReferenceChange, onPhotoChosen }), [initialReference, onReferenceChange, onPhotoChosen]);

  const afterSave = async (saved: { id: string; name: string }, created: boolean) => {
    if (created) {
      const photo = chosen.current;
      if (!photo) return;
      const stored = await keepCasePhoto(saved.id, photo, reference.current);
      if (stored.ok) return;
      leaveNoticeFor(saved.id, `Saved “${saved.name}”, but the photo was not kept: ${stored.message} Choose it again below to keep it with the case profile.`);
      return { goTo: `/library/cases/${saved.id}` };
    }
    if (sameReference(reference.current, kept.current)) return;
    const done = await keepReference(saved.id, reference.current);
    if (!done.ok) return { notice: { tone: "error" as const, text: `Saved “${saved.name}”, but the photo's reference points were not kept: ${done.message}` } };
    kept.current = reference.current;
    setDirty(false);
  };

  return { link, afterSave, dirty, notice };
}

/** One line beside the plan on the crank chamber: what the study will check it with, or that it will not. */
function CrankLine({ units }: { units: LengthUnits }) {
  const crank = useWatch<CaseFormValues, "crank">({ name: "crank" });
  const read = (t: string | undefined) => {
    const r = parseLengthText(t, units);
    return r.ok ? r.value : undefined;
  };
  const axis = read(crank?.deckToAxisMm);
  const radius = read(crank?.webRadiusMm);
  const span = read(crank?.webSpanMm);
  const text =
    axis !== undefined && radius !== undefined && span !== undefined
      ? `Crank chamber: axis ${lengthLabel(axis, units)} below the deck, webs ${lengthLabel(radius, units)} in radius and ${lengthLabel(span, units)} across.`
      : "Crank chamber not given: the study will not check the skirt against the crank webs.";
  return (
    <p className="mt-3 text-sm text-ink-2" data-testid="case-crank-line">
      {text}
    </p>
  );
}
