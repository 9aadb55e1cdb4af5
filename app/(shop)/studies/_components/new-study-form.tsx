"use client";

import Link from "next/link";
import { FormNotice } from "../../../_ui/field";
import { useNewStudy } from "./use-new-study";

type Option = { id: string; name: string };

/** A new study: a name, one case profile, the candidate kits, and a rig if there is one. */
export function NewStudyForm({ onCancel }: { onCancel: () => void }) {
  const f = useNewStudy();
  return (
    <form onSubmit={f.submit} noValidate className="card flex flex-col gap-4 p-5" aria-label="New study">
      <h2 className="text-lg font-semibold">New study</h2>
      {f.noLibrary ? (
        <FormNotice tone="error">
          A study needs a case profile and at least one kit in the library. <Link href="/library">Add them in the library</Link> first.
        </FormNotice>
      ) : null}
      {f.problem ? <FormNotice tone="error">{f.problem}</FormNotice> : null}
      <div className="grid gap-4 md:grid-cols-2">
        <div>
          <label htmlFor="ns-name" className="field-label">
            Name
          </label>
          <input id="ns-name" className="field-input" value={f.name} onChange={(e) => f.setName(e.target.value)} aria-invalid={f.errors.name ? true : undefined} />
          {f.errors.name ? <p className="field-error">{f.errors.name}</p> : null}
        </div>
        <RowSelect id="ns-case" label="Case profile" empty="choose…" options={f.cases.data?.items} value={f.caseId} onChange={f.setCaseId} error={f.errors.caseId} />
        <KitChoices kits={f.kits.data?.items} chosen={f.kitIds} onChange={f.setKitIds} error={f.errors.kitIds} />
        <RowSelect id="ns-rig" label="Boring rig (optional)" empty="none yet" options={f.rigs.data?.items} value={f.rigId} onChange={f.setRigChoice} />
      </div>
      <div className="flex gap-2">
        <button type="submit" className="btn" disabled={f.creating}>
          {f.creating ? "Creating…" : "Create the study"}
        </button>
        <button type="button" className="btn-quiet" onClick={onCancel}>
          Cancel
        </button>
      </div>
    </form>
  );
}

/** A choice of one library row, with what "none chosen" reads as and the message next to it. */
function RowSelect({ id, label, empty, options, value, onChange, error }: { id: string; label: string; empty: string; options: Option[] | undefined; value: string; onChange: (id: string) => void; error?: string }) {
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      <select id={id} className="field-input" value={value} onChange={(e) => onChange(e.target.value)} aria-invalid={error ? true : undefined}>
        <option value="">{empty}</option>
        {options?.map((o) => (
          <option key={o.id} value={o.id}>
            {o.name}
          </option>
        ))}
      </select>
      {error ? <p className="field-error">{error}</p> : null}
    </div>
  );
}

function KitChoices({ kits, chosen, onChange, error }: { kits: Option[] | undefined; chosen: string[]; onChange: (ids: string[]) => void; error?: string }) {
  return (
    <fieldset className="md:col-span-2">
      <legend className="field-label">Candidate kits</legend>
      <div className="mt-1 grid gap-1 sm:grid-cols-2 lg:grid-cols-3">
        {kits?.map((k) => (
          <label key={k.id} className="flex items-center gap-2 text-sm">
            <input type="checkbox" checked={chosen.includes(k.id)} onChange={(e) => onChange(e.target.checked ? [...chosen, k.id] : chosen.filter((x) => x !== k.id))} />
            {k.name}
          </label>
        ))}
      </div>
      {error ? <p className="field-error">{error}</p> : null}
    </fieldset>
  );
}
