"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import type { JobView } from "@/db/jobs";
import { STATUS_LABEL, type JobStatus } from "@/model/job-status";
import { callApi } from "../../../../_ui/api-client";

/** A job's moves and sharing as the page makes them: the reason typed for a move that needs one, which action is under way, and what the last one said. */
export function useJobMoves(job: JobView) {
  const router = useRouter();
  const [reason, setReason] = useState("");
  const [pending, setPending] = useState<string | null>(null);
  const [notice, setNotice] = useState<{ tone: "ok" | "error"; text: string } | null>(null);
  const [reasonFor, setReasonFor] = useState<JobStatus | null>(null);

  async function move(to: JobStatus) {
    if (job.movesNeedingReason.includes(to) && !reason.trim()) {
      setReasonFor(to);
      setNotice({ tone: "error", text: "Say why in the box below; the reason is kept in the job's history." });
      return;
    }
    setPending(to);
    const res = await callApi(`/api/v1/jobs/${job.id}/move`, { body: { to, ...(reason.trim() ? { reason } : {}) } });
    setPending(null);
    if (!res.ok) {
      setNotice({ tone: "error", text: res.error.message });
      return;
    }
    setReason("");
    setReasonFor(null);
    setNotice({ tone: "ok", text: `The job is now ${STATUS_LABEL[to].toLowerCase()}.` });
    router.refresh();
  }

  async function share() {
    setPending("share");
    const res = await callApi<{ invited: boolean }>(`/api/v1/jobs/${job.id}/share`, { body: {} });
    setPending(null);
    if (!res.ok) {
      setNotice({ tone: "error", text: res.error.message });
      return;
    }
    setNotice({
      tone: "ok",
      text: res.data.invited
        ? `Shared: ${job.customer.email} was invited into the shop as a customer; the mail carries the link.`
        : `Shared: ${job.customer.email} has the link to the plan.`,
    });
    router.refresh();
  }

  return { reason, setReason, pending, notice, reasonFor, move, share };
}
