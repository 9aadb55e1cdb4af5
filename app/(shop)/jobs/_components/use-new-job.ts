"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { callApi } from "../../../_ui/api-client";
import { JobCreateSchema } from "@/model/schemas/jobs";

export type NewJobValues = { title: string; customerName: string; customerEmail: string; engineNumber: string; caseNumber: string; caseVariant: string; studyId: string; notes: string; planOverrideReason: string };

const fieldsOf = (issues: { path: PropertyKey[]; message: string }[]) => {
  const out: Record<string, string> = {};
  for (const i of issues) out[i.path.map(String).join(".")] ??= i.message;
  return out;
};

/** The new-job form's state: what is typed, checked as it is typed by the request schema, and the send. */
export function useNewJob(initialStudyId: string) {
  const router = useRouter();
  const [v, setV] = useState<NewJobValues>({ title: "", customerName: "", customerEmail: "", engineNumber: "", caseNumber: "", caseVariant: "", studyId: initialStudyId, notes: "", planOverrideReason: "" });
  const [ownEngine, setOwnEngine] = useState(false);
  // Shown once the server says the study's kit cannot fit safely and planning it needs the owner's reason.
  const [asksOverride, setAsksOverride] = useState(false);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [touched, setTouched] = useState<Record<string, boolean>>({});
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  // The deposit is not typed here: it is the shop's share of the job's quote (written on the job's page).
  const body = () => ({
    title: v.title,
    ...(ownEngine ? { ownEngine: true } : { customerName: v.customerName, customerEmail: v.customerEmail }),
    engineNumber: v.engineNumber,
    caseNumber: v.caseNumber,
    caseVariant: v.caseVariant,
    studyId: v.studyId || null,
    notes: v.notes,
    ...(asksOverride && v.planOverrideReason.trim() ? { planOverrideReason: v.planOverrideReason } : {}),
  });
  const check = () => {
    const r = JobCreateSchema.safeParse(body());
    return r.success ? {} : fieldsOf(r.error.issues);
  };
  const set = (k: keyof NewJobValues) => (e: React.ChangeEvent<HTMLInputElement | HTMLSelectElement | HTMLTextAreaElement>) => {
    setV({ ...v, [k]: e.target.value });
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

  return { v, set, ownEngine, setOwnEngine, asksOverride, errors, shown, problem, busy, submit };
}
