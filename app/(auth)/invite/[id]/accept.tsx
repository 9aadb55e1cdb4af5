"use client";

import { useGo } from "../../../_ui/use-go";
import { useState } from "react";
import { callApi } from "../../../_ui/api-client";
import { FormNotice } from "../../../_ui/field";

export function AcceptInvitation({ id, shopName, role }: { id: string; shopName: string; role: string }) {
  const go = useGo();
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function accept() {
    setBusy(true);
    const accepted = await callApi<{ member?: { organizationId: string } }>("/api/auth/organization/accept-invitation", { body: { invitationId: id } });
    if (!accepted.ok) {
      setBusy(false);
      setProblem(accepted.error.message);
      return;
    }
    const shopId = accepted.data.member?.organizationId;
    if (shopId) await callApi("/api/auth/organization/set-active", { body: { organizationId: shopId } });
    go("/home");
  }

  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-semibold">Join {shopName}</h1>
      <p className="text-ink-2">You are invited as {role}.</p>
      {problem ? <FormNotice tone="error">{problem}</FormNotice> : null}
      <button type="button" className="btn" disabled={busy} onClick={accept}>
        {busy ? "Joining…" : "Accept the invitation"}
      </button>
    </div>
  );
}

/** For a person signed in with the invited address that is not confirmed yet: the confirmation link comes back here. */
export function ConfirmFirst({ id, email, shopName }: { id: string; email: string; shopName: string }) {
  const [notice, setNotice] = useState<{ tone: "error" | "ok"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  async function resend() {
    setBusy(true);
    const sent = await callApi("/api/auth/send-verification-email", { body: { email, callbackURL: `/invite/${id}` } });
    setBusy(false);
    setNotice(sent.ok ? { tone: "ok", text: `Sent again to ${email}.` } : { tone: "error", text: sent.error.message });
  }

  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-semibold">Confirm your e-mail to join {shopName}</h1>
      <p className="text-ink-2">
        We sent a confirmation link to <strong>{email}</strong>. Open it and you come back here to accept the invitation. Only a confirmed
        address can join a shop, so nobody else can take the invitation meant for you.
      </p>
      {notice ? <FormNotice tone={notice.tone}>{notice.text}</FormNotice> : null}
      <button type="button" className="btn-quiet" disabled={busy} onClick={resend}>
        {busy ? "Sending…" : "Send the link again"}
      </button>
    </div>
  );
}
