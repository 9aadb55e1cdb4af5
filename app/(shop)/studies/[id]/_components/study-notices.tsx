"use client";

import { useFormContext } from "react-hook-form";
import { FormNotice } from "../../../../_ui/field";
import { errorText } from "../../../../_ui/query/fetch";
import type { LengthUnits } from "@/model/units";
import type { Evaluation } from "./assemble";
import { ConflictBanner } from "./conflict-banner";
import { StaleNotice } from "./stale-notice";
import type { StudyFormValues, StudyInputs } from "./study-values";
import type { useAutosave } from "./use-autosave";

type Props = {
  save: ReturnType<typeof useAutosave>;
  onReloaded: () => void;
  failed: unknown;
  evaluation: Evaluation | null;
  stale: boolean;
  basis: StudyInputs | null;
  values: StudyFormValues;
  units: LengthUnits;
};

/** What stands between the user and up-to-date results: a conflict, a failed save or load, an input the core refuses, a field being fixed. */
export function StudyNotices({ save, onReloaded, failed, evaluation, stale, basis, values, units }: Props) {
  const form = useFormContext<StudyFormValues>();
  return (
    <>
      {save.status === "conflict" ? (
        <ConflictBanner
          message={save.message ?? ""}
          onOverwrite={save.overwrite}
          onReload={async () => {
            await save.reloadTheirs();
            onReloaded();
          }}
        />
      ) : null}
      {save.status === "error" && save.message ? <FormNotice tone="error">{save.message}</FormNotice> : null}
      {failed ? <FormNotice tone="error">Part of the study could not be loaded: {errorText(failed)}</FormNotice> : null}
      {evaluation && !evaluation.ok ? (
        <FormNotice tone="error">
          The study cannot be evaluated as it stands:{" "}
          {evaluation.issues
            .slice(0, 4)
            .map((i) => `${i.path ? `${i.path}: ` : ""}${i.message}`)
            .join("; ")}
          . Fix it in the library or here; nothing is lost.
        </FormNotice>
      ) : null}
      {stale && !evaluation ? <StaleNotice errors={form.formState.errors} values={values} basis={basis} units={units} /> : null}
    </>
  );
}
