"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { callApi } from "../../../_ui/api-client";
import { Field, FormNotice } from "../../../_ui/field";
import { JobCreateSchema } from "@/model/schemas/jobs";

type StudyOption = { id: string; name: string; kitIds: string[]; chosenKitId: string | null };

const fieldsOf = (issues: { path: PropertyKey[]; message: string }[]) => {
  const out: Record<string, string> = {};
  for (const i of issues) out[i.path.map(String).join(".")] ??= i.message;
  return out;
};

/** The new-job form: checks as the person types, keeps everything typed, says what is wrong next to each field. */
export function NewJobForm({ studies, initialStudyId, isOwner }: { studies: StudyOption[]; initialStudyId: string; isOwner: boolean }) {
  const router = useRouter();
  const [v, setV] = useState({ title: "", customerName: "", customerEmail: "", engineNumber: "", caseNumber: "", caseVariant: "", studyId: initialStudyId, notes: "", planOverrideReason: "" });
  const [ownEngine, setOwnEngine] = useState(false);
  // Shown once the server says the study's kit cannot fit safely and planning it needs the owner's reason.
  const [asksOverride, setAsksOverride] = useState(false);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [touched, setTouched] = useState<Record<string, boolean>>({});
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  // The deposit is not typed here: it is the shop's share of the job's quote (written on the job's page).
  const body = () => {
    return {
      title: v.title,
      ...(ownEngine ? { ownEngine: true } : { customerName: v.customerName, customerEmail: v.customerEmail }),
      engineNumber: v.engineNumber,
      caseNumber: v.caseNumber,
      caseVariant: v.caseVariant,
      studyId: v.studyId || null,
      notes: v.notes,
      ...(asksOverride && v.planOverrideReason.trim() ? { planOverrideReason: v.planOverrideReason } : {}),
    };
  };
  const check = (next = v) => {
    void next;
    const r = JobCreateSchema.safeParse(body());
    const f = r.success ? {} : fieldsOf(r.error.issues);
    return f;
  };
  const set = (k: keyof typeof v) => (e: React.ChangeEvent<HTMLInputElement | HTMLSelectElement | HTMLTextAreaElement>) => {
    const next = { ...v, [k]: e.target.value };
    setV(next);
    setTouched((t) => ({ ...t, [k]: true }));
  };
  const live = check();
  const shown = (k: string) => (touched[k] ? (live[k] ?? errors[k]) : errors[k]);

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    const f = check();
    setErrors(f);
    setTouched(Object.fromEntries(Object.keys(f).map((k) => [k, true])));
    if (Object.keys(f).length) {
      setProblem("Some fields need a look; nothing was lost.");
      return;
    }
    setBusy(true);
    setProblem(null);
    const res = await callApi<{ item: { id: string } }>("/api/v1/jobs", { body: body() });
    setBusy(false);
    if (!res.ok) {
      setErrors(res.error.fields ?? {});
      setProblem(res.error.message);
      if (res.error.fields?.planOverrideReason) setAsksOverride(true);
      return;
    }
    router.push(`/jobs/${res.data.item.id}`);
  }

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
      <div>
        <label htmlFor="field-studyId" className="field-label">Study</label>
        <select id="field-studyId" name="studyId" className="field-input" value={v.studyId} onChange={set("studyId")} aria-describedby="field-studyId-hint">
          <option value="">No study yet (the job opens at intake)</option>
          {studies.map((s) => (
            <option key={s.id} value={s.id}>{s.name}</option>
          ))}
        </select>
        <p id="field-studyId-hint" className="field-hint">With a study, the job is planned with the study&apos;s chosen kit (or its first).</p>
        {errors.studyId || errors.kitId ? <p role="alert" className="field-error">{errors.studyId ?? errors.kitId}</p> : null}
      </div>
      {asksOverride ? (
        isOwner ? (
          <div>
            <label htmlFor="field-planOverrideReason" className="field-label">Why plan it anyway (the owner&apos;s override, kept with the plan)</label>
            <textarea
              id="field-planOverrideReason"
              className="field-input"
              rows={2}
              value={v.planOverrideReason}
              onChange={set("planOverrideReason")}
              aria-describedby="field-planOverrideReason-error"
              aria-invalid={errors.planOverrideReason && !v.planOverrideReason.trim() ? true : undefined}
            />
            {errors.planOverrideReason && !v.planOverrideReason.trim() ? <p id="field-planOverrideReason-error" role="alert" className="field-error">{errors.planOverrideReason}</p> : null}
          </div>
        ) : null
      ) : null}
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
