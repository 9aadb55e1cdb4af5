"use client";

import { Field, FormNotice } from "../../../_ui/field";
import { type NewJobValues, useNewJob } from "./use-new-job";

type StudyOption = { id: string; name: string; kitIds: string[]; chosenKitId: string | null };
type Change = (e: React.ChangeEvent<HTMLInputElement | HTMLSelectElement | HTMLTextAreaElement>) => void;

/** The new-job form: checks as the person types, keeps everything typed, says what is wrong next to each field. */
export function NewJobForm({ studies, initialStudyId, isOwner }: { studies: StudyOption[]; initialStudyId: string; isOwner: boolean }) {
  const { v, set, ownEngine, setOwnEngine, asksOverride, errors, shown, problem, busy, submit } = useNewJob(initialStudyId);
  return (
    <form onSubmit={submit} className="card flex flex-col gap-4 p-6" noValidate>
      {problem ? <FormNotice tone="error">{problem}</FormNotice> : null}
      <Field label="Title" name="title" value={v.title} onChange={set("title")} error={shown("title")} hint="The engine and the customer, as the bench calls it." />
      <label className="flex items-start gap-2 text-sm">
        <input type="checkbox" className="mt-1" checked={ownEngine} onChange={(e) => setOwnEngine(e.target.checked)} />
        <span>
          For my own engine
          <span className="block text-ink-2">The job is the shop&apos;s own: no customer to name, nothing to share, no deposit.</span>
        </span>
      </label>
      {ownEngine ? null : <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Customer's name" name="customerName" value={v.customerName} onChange={set("customerName")} error={shown("customerName")} />
        <Field label="Customer's e-mail" name="customerEmail" type="email" value={v.customerEmail} onChange={set("customerEmail")} error={shown("customerEmail")} hint="The plan is shared to this address." />
      </div>}
      <div className="grid gap-4 sm:grid-cols-3">
        <Field label="Engine number" name="engineNumber" value={v.engineNumber} onChange={set("engineNumber")} error={shown("engineNumber")} />
        <Field label="Case number" name="caseNumber" value={v.caseNumber} onChange={set("caseNumber")} error={shown("caseNumber")} />
        <Field label="Case variant" name="caseVariant" value={v.caseVariant} onChange={set("caseVariant")} error={shown("caseVariant")} hint="e.g. stud pattern" />
      </div>
      <StudyPicker studies={studies} value={v.studyId} onChange={set("studyId")} error={errors.studyId ?? errors.kitId} />
      {asksOverride && isOwner ? <OverrideReason v={v} onChange={set("planOverrideReason")} error={errors.planOverrideReason} /> : null}
      {ownEngine ? null : <p className="text-sm text-ink-2">The price and the deposit come from the job&apos;s quote, written on the job&apos;s page once it is open.</p>}
      <div>
        <label htmlFor="field-notes" className="field-label">Notes</label>
        <textarea id="field-notes" className="field-input" rows={3} value={v.notes} onChange={set("notes")} />
      </div>
      <div>
        <button className="btn" type="submit" disabled={busy}>{busy ? "Opening…" : "Open the job"}</button>
      </div>
    </form>
  );
}

function StudyPicker({ studies, value, onChange, error }: { studies: StudyOption[]; value: string; onChange: Change; error: string | undefined }) {
  return (
    <div>
      <label htmlFor="field-studyId" className="field-label">Study</label>
      <select id="field-studyId" name="studyId" className="field-input" value={value} onChange={onChange} aria-describedby="field-studyId-hint">
        <option value="">No study yet (the job opens at intake)</option>
        {studies.map((s) => (
          <option key={s.id} value={s.id}>{s.name}</option>
        ))}
      </select>
      <p id="field-studyId-hint" className="field-hint">With a study, the job is planned with the study&apos;s chosen kit (or its first).</p>
      {error ? <p role="alert" className="field-error">{error}</p> : null}
    </div>
  );
}

/** The owner's reason for planning a kit the core says cannot fit safely; asked for only once the server refuses without it. */
function OverrideReason({ v, onChange, error }: { v: NewJobValues; onChange: Change; error: string | undefined }) {
  const missing = error && !v.planOverrideReason.trim() ? error : undefined;
  return (
    <div>
      <label htmlFor="field-planOverrideReason" className="field-label">Why plan it anyway (the owner&apos;s override, kept with the plan)</label>
      <textarea
        id="field-planOverrideReason"
        className="field-input"
        rows={2}
        value={v.planOverrideReason}
        onChange={onChange}
        aria-describedby="field-planOverrideReason-error"
        aria-invalid={missing ? true : undefined}
      />
      {missing ? <p id="field-planOverrideReason-error" role="alert" className="field-error">{missing}</p> : null}
    </div>
  );
}
