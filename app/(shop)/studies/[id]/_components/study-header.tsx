"use client";

import { useFormContext } from "react-hook-form";
import { errorAt } from "@/app/_ui/form/field-error";
import { exportStudyUrl } from "../../../../_ui/query/studies/fetchers";
import { SaveStatusBadge } from "./save-status";
import type { StudyFormValues } from "./study-values";
import type { useAutosave } from "./use-autosave";

type Save = ReturnType<typeof useAutosave>;

/** The study's name (editable in place), what it is built on, whether it is saved, and its export. Lengths follow the header's units. */
export function StudyHeader({ studyId, caseName, archived, save }: { studyId: string; caseName: string | null; archived: boolean; save: Save }) {
  const form = useFormContext<StudyFormValues>();
  const kits = form.watch("kitIds").length;
  const nameError = errorAt(form.formState.errors, "name");
  return (
    <header className="flex flex-wrap items-start justify-between gap-3">
      <div className="min-w-0 flex-1 basis-64">
        {/* The page's heading is the study's name; sighted users read it in the field that edits it. */}
        <h1 className="sr-only">{form.watch("name") || "Study"}</h1>
        <label htmlFor="study-name" className="sr-only">
          Study name
        </label>
        <input id="study-name" className="w-full rounded-md border border-transparent bg-transparent px-1 text-2xl font-semibold hover:border-rule focus:border-accent" defaultValue={form.getValues("name")} {...form.register("name")} />
        {nameError ? <p className="field-error">{nameError}</p> : null}
        <p className="px-1 text-sm text-ink-2">
          {caseName ?? "…"} · {kits} kit{kits === 1 ? "" : "s"}
          {archived ? " · archived" : ""}
        </p>
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <SaveStatusBadge status={save.status} savedAt={save.savedAt} />
        {save.status === "error" ? (
          <button type="button" className="btn-quiet" onClick={save.saveNow}>
            Save now
          </button>
        ) : null}
        <a className="btn-quiet no-underline" href={exportStudyUrl(studyId)} download>
          Export study file
        </a>
      </div>
    </header>
  );
}
