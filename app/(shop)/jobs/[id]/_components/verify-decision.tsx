"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { callApi } from "../../../../_ui/api-client";
import { Field, FormNotice } from "../../../../_ui/field";

/**
 * Right under readings outside the plan: the owner may verify the job as it stands with a recorded reason;
 * anyone else is told whose decision it is and what they can do meanwhile.
 */
export function VerifyDecision({ jobId, role }: { jobId: string; role: string }) {
  const router = useRouter();
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  if (role !== "owner") {
    return (
      <p className="rounded-md border-l-4 border-caution bg-caution-soft px-4 py-2 text-sm" data-testid="verify-who">
        Outside the plan: verifying the job as it stands is the shop owner&apos;s decision, with a recorded reason. Ask the owner to look at these readings, or re-cut and record new ones below.
      </p>
    );
  }

  async function verify(e: React.FormEvent) {
    e.preventDefault();
    if (reason.trim().length < 3) return setError("Say why the job is verified although its readings are outside the plan (kept in the job's history).");
    setBusy(true);
    const res = await callApi(`/api/v1/jobs/${jobId}/move`, { body: { to: "verified", reason } });
    setBusy(false);
    if (!res.ok) {
      setError(res.error.fields?.reason ?? null);
      return setNotice(res.error.message);
    }
    router.refresh();
  }

  return (
    <form onSubmit={verify} noValidate className="card flex flex-col gap-3 p-4" aria-label="Verify as it stands" data-testid="verify-override-form">
      <p className="text-sm">The readings are outside the plan. As the owner you may verify the job as it stands; your reason is kept with the job.</p>
      <Field name="verify-reason" id="verify-reason" label="Why verify readings outside the plan" value={reason} error={error ?? undefined} placeholder="e.g. trial fit checked, clearance accepted" onChange={(e) => { setReason(e.target.value); setError(null); }} />
      {notice ? <FormNotice tone="error">{notice}</FormNotice> : null}
      <div><button type="submit" className="btn-quiet" disabled={busy}>{busy ? "Verifying…" : "Verify as it stands (owner's override)"}</button></div>
    </form>
  );
}
