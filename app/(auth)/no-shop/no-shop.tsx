"use client";

import { useGo } from "../../_ui/use-go";
import { useState } from "react";
import { callApi } from "../../_ui/api-client";
import { FormNotice } from "../../_ui/field";

export function NoShop() {
  const go = useGo();
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function create() {
    setBusy(true);
    const result = await callApi("/api/v1/shops", { body: {} });
    setBusy(false);
    if (!result.ok) setProblem(result.error.message);
    else go("/home");
  }

  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-semibold">You belong to no shop yet</h1>
      <p className="text-ink-2">Open the invitation link a shop sent you, or start a workshop of your own.</p>
      {problem ? <FormNotice tone="error">{problem}</FormNotice> : null}
      <button type="button" className="btn" onClick={create} disabled={busy}>
        Start my own workshop
      </button>
      <button type="button" className="btn-quiet" onClick={() => callApi("/api/auth/sign-out", { body: {} }).then(() => go("/sign-in"))}>
        Sign out
      </button>
    </div>
  );
}
