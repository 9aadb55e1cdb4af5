"use client";

import Link from "next/link";
import { useFormContext, useWatch } from "react-hook-form";
import { useLibraryOptions } from "../../../../_ui/query/library/use-library-list";
import type { StudyFormValues } from "./study-values";

/** The case, the candidate kits (add and remove) and the rig. */
export function SelectionPanel({ kitNames }: { kitNames: Record<string, string> }) {
  const { control, setValue } = useFormContext<StudyFormValues>();
  const [caseId, kitIds, rigId, chosen] = useWatch({ control, name: ["caseId", "kitIds", "rigId", "chosenKitId"] });
  const cases = useLibraryOptions("cases");
  const kits = useLibraryOptions("kits");
  const rigs = useLibraryOptions("rigs");
  const addable = (kits.data?.items ?? []).filter((k) => !kitIds.includes(k.id));
  const opts = { shouldDirty: true, shouldValidate: true } as const;

  return (
    <section className="card flex flex-col gap-4 p-4" aria-label="Case, kits and rig">
      <h2 className="font-semibold">Case, kits and rig</h2>
      <label className="block">
        <span className="field-label">Case profile</span>
        <select className="field-input" value={caseId} onChange={(e) => setValue("caseId", e.target.value, opts)}>
          {(cases.data?.items ?? []).map((c) => (
            <option key={c.id} value={c.id}>
              {c.name}
            </option>
          ))}
          {!cases.data?.items.some((c) => c.id === caseId) ? <option value={caseId}>{kitNames[caseId] ?? "the study's case"}</option> : null}
        </select>
      </label>
      <div>
        <span className="field-label">Candidate kits</span>
        <ul className="mt-1 flex flex-col gap-1" aria-label="Kits in this study">
          {kitIds.map((id) => (
            <li key={id} className="flex items-center justify-between gap-2 rounded-md bg-paper-2/60 px-3 py-1.5 text-sm">
              <span>
                {kitNames[id] ?? "…"} {chosen === id ? <span className="ml-1 rounded bg-accent px-1.5 text-xs text-paper">choice</span> : null}
              </span>
              <button
                type="button"
                className="text-sm text-error disabled:opacity-40"
                disabled={kitIds.length <= 1}
                title={kitIds.length <= 1 ? "A study keeps at least one kit" : undefined}
                onClick={() => {
                  setValue("kitIds", kitIds.filter((k) => k !== id), opts);
                  if (chosen === id) setValue("chosenKitId", "", opts);
                }}
                aria-label={`Remove ${kitNames[id] ?? "kit"}`}
              >
                Remove
              </button>
            </li>
          ))}
        </ul>
        {addable.length ? (
          <select className="field-input" value="" aria-label="Add a kit" onChange={(e) => e.target.value && setValue("kitIds", [...kitIds, e.target.value], opts)}>
            <option value="">Add a kit…</option>
            {addable.map((k) => (
              <option key={k.id} value={k.id}>
                {k.name}
              </option>
            ))}
          </select>
        ) : (
          <p className="field-hint">
            Every kit in the library is in this study. <Link href="/library/kits/new">Add a kit to the library</Link>.
          </p>
        )}
      </div>
      <label className="block">
        <span className="field-label">Boring rig</span>
        <select className="field-input" value={rigId} onChange={(e) => setValue("rigId", e.target.value, opts)}>
          <option value="">none (no set-up figures)</option>
          {(rigs.data?.items ?? []).map((r) => (
            <option key={r.id} value={r.id}>
              {r.name}
            </option>
          ))}
        </select>
      </label>
    </section>
  );
}
