"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { TRIAL_FIT, TRIAL_FIT_LABEL, type AfterCutReadings, type TrialFit } from "@/db/verification";
import { callApi } from "../../../../_ui/api-client";
import { FormNotice } from "../../../../_ui/field";
import { readingsRequest, readingsText, type ReadingsText } from "./readings-values";

type Errors = Record<string, string>;

const VERDICT_NOTICE: Record<string, { tone: "ok" | "error"; text: string }> = {
  pass: { tone: "ok", text: "Recorded: within the plan. The job can be marked verified." },
  fail: { tone: "error", text: "Recorded: outside the plan — see the lines marked outside." },
};
const INCOMPLETE = { tone: "error" as const, text: "Recorded, but incomplete: see the lines marked missing." };

/** The after-cut readings form: worst reading wins; the server verifies against the plan and keeps every save. */
export function ReadingsForm({ jobId, studs, previous }: { jobId: string; studs: string[]; previous: AfterCutReadings | null }) {
  const router = useRouter();
  const [t, setT] = useState<ReadingsText>(() => readingsText(previous, studs));
  const patch = (p: Partial<ReadingsText>) => setT((old) => ({ ...old, ...p }));
  const [errors, setErrors] = useState<Errors>({});
  const [notice, setNotice] = useState<{ tone: "ok" | "error"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    const { body, errors: f } = readingsRequest(t, studs);
    setErrors(f);
    if (Object.keys(f).length) {
      setNotice({ tone: "error", text: "Some readings need a look; nothing was lost." });
      return;
    }
    setBusy(true);
    const res = await callApi<{ verification: { verdict: string } }>(`/api/v1/jobs/${jobId}/readings`, { body });
    setBusy(false);
    if (!res.ok) {
      setErrors(Object.fromEntries(Object.entries(res.error.fields ?? {}).map(([k, v]) => [k.split(".")[0], v])));
      setNotice({ tone: "error", text: res.error.message });
      return;
    }
    setNotice(VERDICT_NOTICE[res.data.verification.verdict] ?? INCOMPLETE);
    router.refresh();
  }

  return (
    <form onSubmit={submit} className="card flex flex-col gap-4 p-4" noValidate aria-label="After-cut readings">
      <h3 className="font-semibold">Record after-cut readings</h3>
      <CutReadings t={t} patch={patch} errors={errors} />
      <fieldset className="grid gap-3 sm:grid-cols-4">
        <legend className="field-label">Sealing land at each stud (mm)</legend>
        {studs.map((s) => (
          <div key={s}>
            <label className="text-sm text-ink-2" htmlFor={`r-land-${s}`}>{s}</label>
            <input id={`r-land-${s}`} className="field-input num" value={t.lands[s] ?? ""} onChange={(e) => patch({ lands: { ...t.lands, [s]: e.target.value } })} />
            <ErrorLine text={errors[`land-${s}`]} />
          </div>
        ))}
        {errors.sealingLandMm ? <p role="alert" className="field-error sm:col-span-4">{errors.sealingLandMm}</p> : null}
      </fieldset>
      <AssemblyChecks t={t} patch={patch} errors={errors} />
      <div>
        <label className="field-label" htmlFor="r-notes">Notes</label>
        <input id="r-notes" className="field-input" value={t.notes} onChange={(e) => patch({ notes: e.target.value })} />
      </div>
      {notice ? <FormNotice tone={notice.tone}>{notice.text}</FormNotice> : null}
      <div>
        <button className="btn" type="submit" disabled={busy}>{busy ? "Verifying…" : "Save and verify"}</button>
      </div>
    </form>
  );
}

type Part = { t: ReadingsText; patch: (p: Partial<ReadingsText>) => void; errors: Errors };

const ErrorLine = ({ text }: { text: string | undefined }) => (text ? <p role="alert" className="field-error">{text}</p> : null);

/** The cut's diameter and depth, each read at several spots. */
function CutReadings({ t, patch, errors }: Part) {
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <div>
        <label className="field-label" htmlFor="r-diam">Cut diameter readings <span className="num text-ink-3">(mm)</span></label>
        <input id="r-diam" className="field-input num" value={t.diam} onChange={(e) => patch({ diam: e.target.value })} placeholder="55.10 55.12 55.08" aria-invalid={errors.cutDiameterMm ? true : undefined} />
        <p className="field-hint">Several readings around the bore; the smallest counts for clearance.</p>
        <ErrorLine text={errors.cutDiameterMm} />
      </div>
      <div>
        <label className="field-label" htmlFor="r-depth">Cut depth readings <span className="num text-ink-3">(mm)</span></label>
        <input id="r-depth" className="field-input num" value={t.depth} onChange={(e) => patch({ depth: e.target.value })} placeholder="25.25 25.27" aria-invalid={errors.cutDepthMm ? true : undefined} />
        <p className="field-hint">Below the deck; the shallowest counts.</p>
        <ErrorLine text={errors.cutDepthMm} />
      </div>
    </div>
  );
}

/** What went into the assembly: the gasket stack, the trial fit and the chips cleaned out. */
function AssemblyChecks({ t, patch, errors }: Part) {
  return (
    <div className="grid gap-4 sm:grid-cols-3">
      <div>
        <label className="field-label" htmlFor="r-gasket">Gasket stack used <span className="num text-ink-3">(mm)</span></label>
        <input id="r-gasket" className="field-input num" value={t.gasket} onChange={(e) => patch({ gasket: e.target.value })} placeholder="0.2" />
        <ErrorLine text={errors.gasketStackMm} />
      </div>
      <div>
        <label className="field-label" htmlFor="r-trial">Trial fit</label>
        <select id="r-trial" className="field-input" value={t.trial} onChange={(e) => patch({ trial: e.target.value as TrialFit })}>
          {TRIAL_FIT.map((x) => (
            <option key={x} value={x}>{TRIAL_FIT_LABEL[x]}</option>
          ))}
        </select>
      </div>
      <label className="flex items-center gap-2 self-end pb-2 text-sm">
        <input type="checkbox" checked={t.chips} onChange={(e) => patch({ chips: e.target.checked })} /> Crankcase cleaned of every chip
      </label>
    </div>
  );
}
