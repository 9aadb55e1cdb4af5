"use client";

import { useGo } from "../../_ui/use-go";
import { useState } from "react";
import { callApi } from "../../_ui/api-client";
import { UnitToggle } from "../../_ui/form/unit-toggle";

type Shop = { id: string; name: string; role: string };

/** The shop switcher, the units toggle and sign-out. */
export function HeaderControls({ shops, activeShopId, units }: { shops: Shop[]; activeShopId: string; units: "mm" | "in" }) {
  const go = useGo();
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);

  async function run(url: string, body: unknown, then: () => void) {
    setBusy(true);
    setProblem(null);
    const result = await callApi(url, { body });
    setBusy(false);
    if (!result.ok) setProblem(result.error.message);
    else then();
  }

  return (
    <div className="flex flex-wrap items-center gap-3 text-sm">
      {shops.length > 1 ? (
        <label className="flex items-center gap-2">
          <span className="text-ink-2">Shop</span>
          <select
            aria-label="Switch shop"
            className="rounded-md border border-rule bg-card px-2 py-1"
            value={activeShopId}
            disabled={busy}
            onChange={(e) => run("/api/auth/organization/set-active", { organizationId: e.target.value }, () => go("/home"))}
          >
            {shops.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name} ({s.role})
              </option>
            ))}
          </select>
        </label>
      ) : null}
      {/* A new preference reloads the page, so a study or form already open shows it too. */}
      <UnitToggle units={units} label="Length units" compact disabled={busy} onChange={(u) => run("/api/v1/me", { units: u }, () => window.location.reload())} />
      <button type="button" className="btn-quiet" disabled={busy} onClick={() => run("/api/auth/sign-out", {}, () => go("/sign-in"))}>
        Sign out
      </button>
      {problem ? (
        <span role="alert" className="text-error">
          {problem}
        </span>
      ) : null}
    </div>
  );
}
