"use client";

import type { JobView } from "@/db/jobs";
import { STATUS_LABEL, type JobStatus } from "@/model/job-status";
import { FormNotice } from "../../../../_ui/field";
import { useJobMoves } from "./use-job-moves";

const VERB: Partial<Record<string, string>> = {
  "intake>planned": "Mark planned",
  "planned>approved": "Approve for the customer",
  "planned>intake": "Back to intake",
  "approved>machined": "Mark machined",
  "approved>planned": "Back to planned (re-plan)",
  "machined>verified": "Mark verified",
  "verified>closed": "Close the job",
  "verified>machined": "Back to machined",
};

/** The button's words for a move, where the job's state changes what the move means. */
function verb(job: JobView, to: JobStatus): string {
  const key = `${job.status}>${to}`;
  const asks = job.movesNeedingReason.includes(to);
  if (key === "intake>planned" && asks) return "Plan anyway (owner's override)";
  if (key === "machined>verified" && asks) return "Verify as it stands (owner's override)";
  if (key === "planned>approved" && job.ownEngine) return "Approve the plan";
  return VERB[key] ?? `Move to ${STATUS_LABEL[to].toLowerCase()}`;
}

/** What the reason box asks for, given the moves that need one from here. */
function reasonLabel(job: JobView): string {
  const asks = job.movesNeedingReason;
  if (job.status === "intake" && asks.includes("planned")) return "Why plan a kit the study says cannot fit safely (kept with the plan)";
  if (job.status === "machined" && asks.includes("verified")) return "Why verify readings outside the plan (kept in the job's history)";
  return "Reason (needed to approve for the customer or to go back a step)";
}

/** The moves this person may make from here, the reason when one is needed, and sharing with the customer. */
export function JobActions({ job, role, hasPlan }: { job: JobView; role: string; hasPlan: boolean }) {
  const { reason, setReason, pending, notice, reasonFor, move, share } = useJobMoves(job);
  // Verifying is offered beside the readings, and only once they are within the plan: readings outside it are the
  // owner's decision with a reason (the form under them), missing readings are recorded first.
  const moves = job.moves.filter((to) => !(to === "approved" && role !== "owner") && !(to === "verified" && job.status === "machined" && job.verification?.verdict !== "pass"));
  const canShare = hasPlan && !job.ownEngine && job.status !== "closed";
  const waiting = job.status === "planned" && role !== "owner" && !job.ownEngine;
  const asksReason = moves.some((to) => job.movesNeedingReason.includes(to));
  // Nothing to do from here (a closed job): no empty box, a one-line note instead.
  if (moves.length === 0 && !canShare && !waiting) return <NothingToDo closed={job.status === "closed"} notice={notice} />;
  return (
    <div className="card flex flex-col gap-3 p-4">
      <div className="flex flex-wrap items-center gap-2">
        {moves.map((to) => (
          <button key={to} type="button" className={to === "closed" || job.movesNeedingReason.includes(to) ? "btn-quiet" : "btn"} disabled={pending !== null} onClick={() => move(to)}>
            {pending === to ? "Moving…" : verb(job, to)}
          </button>
        ))}
        {canShare ? (
          <button type="button" className="btn-quiet" disabled={pending !== null} onClick={share}>
            {pending === "share" ? "Sharing…" : job.sharedAt ? "Share again with the customer" : "Share with the customer"}
          </button>
        ) : null}
        {waiting ? <span className="text-sm text-ink-2">Waiting for the customer&apos;s approval.</span> : null}
      </div>
      {reasonFor || asksReason ? (
        <div>
          <label htmlFor="move-reason" className="field-label">{reasonLabel(job)}</label>
          <input id="move-reason" className="field-input" value={reason} onChange={(e) => setReason(e.target.value)} placeholder="e.g. approved by phone on 2 March" />
        </div>
      ) : null}
      {notice ? <FormNotice tone={notice.tone}>{notice.text}</FormNotice> : null}
    </div>
  );
}

/** A job with no move left: a closed job says so; otherwise only what the last action said, if anything. */
function NothingToDo({ closed, notice }: { closed: boolean; notice: { tone: "ok" | "error"; text: string } | null }) {
  if (!closed && !notice) return null;
  return (
    <div className="flex flex-col gap-2">
      {closed ? <p className="text-sm text-ink-2" data-testid="job-closed">This job is closed.</p> : null}
      {notice && !(closed && notice.tone === "ok") ? <FormNotice tone={notice.tone}>{notice.text}</FormNotice> : null}
    </div>
  );
}
