"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import type { JobView } from "@/db/jobs";
import { dateTimeText } from "@/model/dates";
import { callApi } from "../../../../_ui/api-client";
import { FormNotice } from "../../../../_ui/field";
import { money } from "../../../jobs/_components/status-badge";

type Notice = { tone: "ok" | "error"; text: string };

/** What the page says on coming back from the payment service. */
function checkoutNotice(checkout: string | null, paid: boolean): Notice | null {
  if (checkout === "done" && !paid) return { tone: "ok", text: "Thank you — the payment is being confirmed; this page shows it paid as soon as the payment service confirms it." };
  if (checkout === "cancelled") return { tone: "error", text: "The payment was not completed. You can try again." };
  return null;
}

/** Approve the plan, pay the deposit, or ask the shop a question. */
export function ConsultActions({ job, checkout, zone }: { job: JobView; checkout: string | null; zone: string }) {
  const router = useRouter();
  const [busy, setBusy] = useState<string | null>(null);
  const [notice, setNotice] = useState<Notice | null>(checkoutNotice(checkout, job.deposit.paid));

  async function approve() {
    setBusy("approve");
    // The approval names the quote this page shows; a quote changed since is refused, and the page reloads it.
    const res = await callApi(`/api/v1/consult/${job.id}/approve`, { body: { quoteFingerprint: job.quote?.fingerprint ?? null } });
    setBusy(null);
    if (!res.ok) {
      setNotice({ tone: "error", text: res.error.message });
      if (res.status === 409) router.refresh();
      return;
    }
    setNotice({ tone: "ok", text: job.quote ? "Thank you — the plan and the price are approved." : "Thank you — the plan is approved." });
    router.refresh();
  }
  async function pay() {
    setBusy("pay");
    const res = await callApi<{ url: string }>("/api/v1/payments/checkout", { body: { jobId: job.id } });
    if (!res.ok) {
      setBusy(null);
      return setNotice({ tone: "error", text: res.error.message });
    }
    window.location.assign(res.data.url);
  }

  const canPay = job.deposit.amount > 0 && !job.deposit.paid && ["approved", "machined", "verified"].includes(job.status);
  return (
    <section aria-label="Your decision" className="card flex flex-col gap-4 p-5">
      <Approval job={job} zone={zone} busy={busy} onApprove={approve} />
      {canPay ? (
        <div className="flex flex-wrap items-center gap-3">
          <button className="btn text-lg" type="button" disabled={busy !== null} onClick={pay}>{busy === "pay" ? "Opening the checkout…" : `Pay the deposit (${money(job.deposit.amount, job.deposit.currency)})`}</button>
          <span className="text-ink-2">By card, on the payment service&apos;s secure page.</span>
        </div>
      ) : job.deposit.paid ? (
        <p className="text-lg text-success" data-testid="deposit-paid">Deposit paid. Thank you.</p>
      ) : null}
      <QuestionForm
        jobId={job.id}
        busy={busy}
        onBusy={setBusy}
        onSent={() => {
          setNotice({ tone: "ok", text: "Your question was sent to the shop; the answer comes by e-mail or phone." });
          router.refresh();
        }}
      />
      {notice ? <FormNotice tone={notice.tone}>{notice.text}</FormNotice> : null}
    </section>
  );
}

/** Who approved and when; else the approve button while the plan waits for it (not while the kit is still being priced). */
function Approval({ job, zone, busy, onApprove }: { job: JobView; zone: string; busy: string | null; onApprove: () => void }) {
  if (job.approval) {
    return (
      <p className="text-lg" data-testid="approved-line">
        {job.approvedQuote ? "The plan and the price were approved" : "The plan was approved"} by {job.approval.by.name} on {dateTimeText(job.approval.at, zone)}.
      </p>
    );
  }
  if (job.status !== "planned") return null;
  if (job.quote?.quote.kitStale) return <p className="text-lg" data-testid="approve-waits">The shop is still pricing the kit; you can approve the plan and the price once it is written.</p>;
  return (
    <div className="flex flex-wrap items-center gap-3">
      <button className="btn text-lg" type="button" disabled={busy !== null} onClick={onApprove}>{busy === "approve" ? "Approving…" : job.quote ? "Approve the plan and the price" : "Approve this plan"}</button>
      <span className="text-ink-2">{job.quote ? "One approval for both; it records your name and the time on the job, and the price is fixed from then on." : "Approving records your name and the time on the job."}</span>
    </div>
  );
}

function QuestionForm({ jobId, busy, onBusy, onSent }: { jobId: string; busy: string | null; onBusy: (what: string | null) => void; onSent: () => void }) {
  const [question, setQuestion] = useState("");
  const [questionError, setQuestionError] = useState<string | null>(null);

  async function ask(e: React.FormEvent) {
    e.preventDefault();
    if (question.trim().length < 3) return setQuestionError("Write your question (a few words at least).");
    setQuestionError(null);
    onBusy("ask");
    const res = await callApi(`/api/v1/jobs/${jobId}/questions`, { body: { text: question } });
    onBusy(null);
    if (!res.ok) return setQuestionError(res.error.fields?.text ?? res.error.message);
    setQuestion("");
    onSent();
  }

  return (
    <form onSubmit={ask} className="flex flex-col gap-2" noValidate>
      <label htmlFor="consult-question" className="field-label">Ask the shop a question</label>
      <textarea id="consult-question" className="field-input" rows={2} value={question} onChange={(e) => setQuestion(e.target.value)} aria-invalid={questionError ? true : undefined} />
      {questionError ? <p role="alert" className="field-error">{questionError}</p> : null}
      <div><button className="btn-quiet" type="submit" disabled={busy !== null}>{busy === "ask" ? "Sending…" : "Send the question"}</button></div>
    </form>
  );
}
