"use client";

import type { LengthUnits } from "@/geometry";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { coreResolver, type FormContext } from "@/app/_ui/form/core-resolver";
import { convertLengthTexts, type UnitSwitchMemory } from "@/app/_ui/form/units-text";
import type { StudyDetail } from "../../../../_ui/query/types";
import { studyBody } from "./study-body";
import { StudyInputsSchema, studyDefaults, studyToCore, type StudyFormValues, type StudyInputs } from "./study-values";
import { useAutosave } from "./use-autosave";
import { readStudyInputs, useStudyInputs } from "./use-study-inputs";

/** The study's inputs read from its texts turned into mm (the memory of the conversion gives back the mm as stored). */
function inputsInMm(values: StudyFormValues, units: LengthUnits, memory: UnitSwitchMemory): StudyInputs | null {
  return readStudyInputs(units === "mm" ? values : convertLengthTexts(values, units, "mm", new Map(memory)), "mm");
}

/**
 * The study's form in the user's units (the header's units toggle sets them), its inputs as the core reads
 * them, and background saving. What is saved is read as mm through the memory of the first conversion, so
 * opening a study in inches saves nothing by itself.
 */
export function useStudyForm(detail: StudyDetail, units: LengthUnits) {
  const item = detail.item;
  const [resolver] = useState(() => coreResolver<StudyFormValues, typeof StudyInputsSchema>(StudyInputsSchema, studyToCore));
  const [memory] = useState<UnitSwitchMemory>(() => new Map());
  const [defaults] = useState(() => convertLengthTexts(studyDefaults(item, "mm"), "mm", units, memory));
  const form = useForm<StudyFormValues, FormContext, StudyInputs>({ mode: "onChange", defaultValues: defaults, resolver, context: { units } });
  const values = useWatch({ control: form.control }) as StudyFormValues;
  const inputs = useStudyInputs(values, units);

  const sel = { caseId: values.caseId, kitIds: values.kitIds, rigId: values.rigId, chosenKitId: values.chosenKitId };
  const body = studyBody(inputsInMm(values, units, memory), sel);
  const [initialBody] = useState(() => studyBody(inputsInMm(defaults, units, memory), defaults) ?? "");
  const save = useAutosave(item.id, item.version, initialBody, body);
  return { form, values, inputs, save };
}
