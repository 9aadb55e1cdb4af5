"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import type { JobView } from "@/db/jobs";
import { dateTimeText } from "@/model/dates";
import { callApi } from "../../../../_ui/api-client";
import { FormNotice } from "../../../../_ui/field";
import { money } from "../../../jobs/_components/status-badge";

/** Approve the plan, pay the deposit, or ask the shop a question. */
export function ConsultActions({ job, checkout, zone }: { job: JobView; checkout: string | null; zone: string }) {
  const router = useRouter();
  const [busy, setBusy] = useState<string | null>(null);
  const [notice, setNotice] = useState<{ tone: "ok" | "error"; text: string } | null>(
    checkout === "done" && !job.deposit.paid
      ? { tone: "ok", text: "Thank you — the payment is being confirmed; this page shows it paid as soon as the payment service confirms it." }
      : checkout === "cancelled"
        ? { tone: "error", text: "The payment was not completed. You can try again." }
        : null,
  );
  const [question, setQuestion] = useState("");
  const [questionError, setQuestionError] = useState<string | null>(null);

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
  async function ask(e: React.FormEvent) {
    e.preventDefault();
    if (question.trim().length < 3) return setQuestionError("Write your question (a few words at least).");
    setQuestionError(null);
    setBusy("ask");
    const res = await callApi(`/api/v1/jobs/${job.id}/questions`, { body: { text: question } });
    setBusy(null);
    if (!res.ok) return setQuestionError(res.error.fields?.text ?? res.error.message);
    setQuestion("");
    setNotice({ tone: "ok", text: "Your question was sent to the shop; the answer comes by e-mail or phone." });
    router.refresh();
  }

  const canPay = job.deposit.amount > 0 && !job.deposit.paid && ["approved", "machined", "verified"].includes(job.status);
  return (
    <section aria-label="Your decision" className="card flex flex-col gap-4 p-5">
      {job.approval ? (
        <p className="text-lg" data-testid="approved-line">
          {job.approvedQuote ? "The plan and the price were approved" : "The plan was approved"} by {job.approval.by.name} on {dateTimeText(job.approval.at, zone)}.
        </p>
      ) : job.status === "planned" && job.quote?.quote.kitStale ? (
        <p className="text-lg" data-testid="approve-waits">The shop is still pricing the kit; you can approve the plan and the price once it is written.</p>
      ) : job.status === "planned" ? (
        <div className="flex flex-wrap items-center gap-3">
          <button className="btn text-lg" type="button" disabled={busy !== null} onClick={approve}>{busy === "approve" ? "Approving…" : job.quote ? "Approve the plan and the price" : "Approve this plan"}</button>
          <span className="text-ink-2">{job.quote ? "One approval for both; it records your name and the time on the job, and the price is fixed from then on." : "Approving records your name and the time on the job."}</span>
        </div>
      ) : null}
      {canPay ? (
        <div className="flex flex-wrap items-center gap-3">
          <button className="btn text-lg" type="button" disabled={busy !== null} onClick={pay}>{busy === "pay" ? "Opening the checkout…" : `Pay the deposit (${money(job.deposit.amount, job.deposit.currency)})`}</button>
          <span className="text-ink-2">By card, on the payment service&apos;s secure page.</span>
        </div>
      ) : job.deposit.paid ? (
        <p className="text-lg text-success" data-testid="deposit-paid">Deposit paid. Thank you.</p>
      ) : null}
      <form onSubmit={ask} className="flex flex-col gap-2" noValidate>
        <label htmlFor="consult-question" className="field-label">Ask the shop a question</label>
        <textarea id="consult-question" className="field-input" rows={2} value={question} onChange={(e) => setQuestion(e.target.value)} aria-invalid={questionError ? true : undefined} />
        {questionError ? <p role="alert" className="field-error">{questionError}</p> : null}
        <div><button className="btn-quiet" type="submit" disabled={busy !== null}>{busy === "ask" ? "Sending…" : "Send the question"}</button></div>
      </form>
      {notice ? <FormNotice tone={notice.tone}>{notice.text}</FormNotice> : null}
    </section>
  );
}
