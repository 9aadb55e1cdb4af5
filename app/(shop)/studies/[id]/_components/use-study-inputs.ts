"use client";

import type { LengthUnits } from "@/geometry";
import { useMemo } from "react";
import { FormReader } from "@/app/_ui/form/form-reader";
import { StudyInputsSchema, studyToCore, type StudyFormValues, type StudyInputs } from "./study-values";

/** The form's texts read into the core's inputs, or null while any field is wrong. */
export function readStudyInputs(values: StudyFormValues, units: LengthUnits): StudyInputs | null {
  const read = new FormReader(units);
  const input = studyToCore(values, read);
  if (read.issues.length) return null;
  const r = StudyInputsSchema.safeParse(input);
  return r.success ? r.data : null;
}

export function useStudyInputs(values: StudyFormValues, units: LengthUnits): StudyInputs | null {
  return useMemo(() => readStudyInputs(values, units), [values, units]);
}
