"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { AfterCutReadingsSchema, TRIAL_FIT, TRIAL_FIT_LABEL, type AfterCutReadings, type TrialFit } from "@/db/verification";
import { callApi } from "../../../../_ui/api-client";
import { FormNotice } from "../../../../_ui/field";

/** Reads "55.10 55.12, 55.08" into numbers; a comma as a decimal point is refused in words, not guessed. */
function parseList(text: string): { values: number[]; error?: string } {
  const parts = text.split(/[\s;]+/).map((p) => p.trim()).filter(Boolean);
  if (parts.some((p) => /^\d+,\d+$/.test(p))) return { values: [], error: "Use a point for decimals (55.10), and spaces between readings." };
  const values = parts.map(Number);
  if (values.some((v) => !Number.isFinite(v))) return { values: [], error: "Each reading is a number in mm, separated by spaces." };
  return { values };
}

const issuesOf = (r: ReturnType<typeof AfterCutReadingsSchema.safeParse>) => {
  const out: Record<string, string> = {};
  if (!r.success) for (const i of r.error.issues) out[i.path.map(String)[0] ?? ""] ??= i.message;
  return out;
};

/** The after-cut readings form: worst reading wins; the server verifies against the plan and keeps every save. */
export function ReadingsForm({ jobId, studs, previous }: { jobId: string; studs: string[]; previous: AfterCutReadings | null }) {
  const router = useRouter();
  const [diam, setDiam] = useState(previous?.cutDiameterMm.join(" ") ?? "");
  const [depth, setDepth] = useState(previous?.cutDepthMm.join(" ") ?? "");
  const [lands, setLands] = useState<Record<string, string>>(Object.fromEntries(studs.map((s) => [s, String(previous?.sealingLandMm.find((l) => l.stud === s)?.valueMm ?? "")])));
  const [gasket, setGasket] = useState(previous ? String(previous.gasketStackMm) : "");
  const [chips, setChips] = useState(previous?.chipsCleaned ?? false);
  const [trial, setTrial] = useState<TrialFit>(previous?.trialFit ?? "not-tried");
  const [notes, setNotes] = useState(previous?.notes ?? "");
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [notice, setNotice] = useState<{ tone: "ok" | "error"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    const d = parseList(diam);
    const z = parseList(depth);
    const f: Record<string, string> = {};
    if (d.error) f.cutDiameterMm = d.error;
    if (z.error) f.cutDepthMm = z.error;
    const sealing = studs.filter((s) => lands[s]?.trim()).map((s) => ({ stud: s, valueMm: Number(lands[s].replace(/\s/g, "")) }));
    studs.forEach((s) => {
      const raw = lands[s]?.trim() ?? "";
      if (raw && !/^\d+(\.\d+)?$/.test(raw)) f[`land-${s}`] = "A number in mm, with a point for decimals.";
    });
    if (gasket.trim() && !/^\d+(\.\d+)?$/.test(gasket.trim())) f.gasketStackMm = "A number in mm, with a point for decimals.";
    const body = { cutDiameterMm: d.values, cutDepthMm: z.values, sealingLandMm: sealing, gasketStackMm: gasket.trim() === "" ? Number.NaN : Number(gasket), chipsCleaned: chips, trialFit: trial, ...(notes ? { notes } : {}) };
    const parsed = AfterCutReadingsSchema.safeParse(body);
    Object.assign(f, { ...issuesOf(parsed), ...f });
    if (gasket.trim() === "") f.gasketStackMm = "Give the gasket stack used (0 for none).";
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
    const v = res.data.verification.verdict;
    setNotice({ tone: v === "pass" ? "ok" : "error", text: v === "pass" ? "Recorded: within the plan. The job can be marked verified." : v === "fail" ? "Recorded: outside the plan — see the lines marked outside." : "Recorded, but incomplete: see the lines marked missing." });
    router.refresh();
  }

  const err = (k: string) => (errors[k] ? <p role="alert" className="field-error">{errors[k]}</p> : null);
  return (
    <form onSubmit={submit} className="card flex flex-col gap-4 p-4" noValidate aria-label="After-cut readings">
      <h3 className="font-semibold">Record after-cut readings</h3>
      <div className="grid gap-4 sm:grid-cols-2">
        <div>
          <label className="field-label" htmlFor="r-diam">Cut diameter readings <span className="num text-ink-3">(mm)</span></label>
          <input id="r-diam" className="field-input num" value={diam} onChange={(e) => setDiam(e.target.value)} placeholder="55.10 55.12 55.08" aria-invalid={errors.cutDiameterMm ? true : undefined} />
          <p className="field-hint">Several readings around the bore; the smallest counts for clearance.</p>
          {err("cutDiameterMm")}
        </div>
        <div>
          <label className="field-label" htmlFor="r-depth">Cut depth readings <span className="num text-ink-3">(mm)</span></label>
          <input id="r-depth" className="field-input num" value={depth} onChange={(e) => setDepth(e.target.value)} placeholder="25.25 25.27" aria-invalid={errors.cutDepthMm ? true : undefined} />
          <p className="field-hint">Below the deck; the shallowest counts.</p>
          {err("cutDepthMm")}
        </div>
      </div>
      <fieldset className="grid gap-3 sm:grid-cols-4">
        <legend className="field-label">Sealing land at each stud (mm)</legend>
        {studs.map((s) => (
          <div key={s}>
            <label className="text-sm text-ink-2" htmlFor={`r-land-${s}`}>{s}</label>
            <input id={`r-land-${s}`} className="field-input num" value={lands[s] ?? ""} onChange={(e) => setLands({ ...lands, [s]: e.target.value })} />
            {err(`land-${s}`)}
          </div>
        ))}
        {errors.sealingLandMm ? <p role="alert" className="field-error sm:col-span-4">{errors.sealingLandMm}</p> : null}
      </fieldset>
      <div className="grid gap-4 sm:grid-cols-3">
        <div>
          <label className="field-label" htmlFor="r-gasket">Gasket stack used <span className="num text-ink-3">(mm)</span></label>
          <input id="r-gasket" className="field-input num" value={gasket} onChange={(e) => setGasket(e.target.value)} placeholder="0.2" />
          {err("gasketStackMm")}
        </div>
        <div>
          <label className="field-label" htmlFor="r-trial">Trial fit</label>
          <select id="r-trial" className="field-input" value={trial} onChange={(e) => setTrial(e.target.value as TrialFit)}>
            {TRIAL_FIT.map((t) => (
              <option key={t} value={t}>{TRIAL_FIT_LABEL[t]}</option>
            ))}
          </select>
        </div>
        <label className="flex items-center gap-2 self-end pb-2 text-sm">
          <input type="checkbox" checked={chips} onChange={(e) => setChips(e.target.checked)} /> Crankcase cleaned of every chip
        </label>
      </div>
      <div>
        <label className="field-label" htmlFor="r-notes">Notes</label>
        <input id="r-notes" className="field-input" value={notes} onChange={(e) => setNotes(e.target.value)} />
      </div>
      {notice ? <FormNotice tone={notice.tone}>{notice.text}</FormNotice> : null}
      <div>
        <button className="btn" type="submit" disabled={busy}>{busy ? "Verifying…" : "Save and verify"}</button>
      </div>
    </form>
  );
}
