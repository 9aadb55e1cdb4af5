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
