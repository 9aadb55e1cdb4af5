"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { FormNotice } from "../../../_ui/field";
import { ApiFailure, errorText } from "../../../_ui/query/fetch";
import { useLibraryOptions } from "../../../_ui/query/library/use-library-list";
import { useStudyActions } from "../../../_ui/query/studies/use-studies";

type Errors = Partial<Record<"name" | "caseId" | "kitIds", string>>;

/** A new study: a name, one case profile, the candidate kits, and a rig if there is one. */
export function NewStudyForm({ onCancel }: { onCancel: () => void }) {
  const router = useRouter();
  const cases = useLibraryOptions("cases");
  const kits = useLibraryOptions("kits");
  const rigs = useLibraryOptions("rigs");
  const { create } = useStudyActions(() => undefined);
  const [name, setName] = useState("");
  const [caseId, setCaseId] = useState("");
  const [kitIds, setKitIds] = useState<string[]>([]);
  // A shop with one rig gets it preselected; a choice the person makes (even "none yet") is kept.
  const [rigChoice, setRigChoice] = useState<string | null>(null);
  const onlyRig = rigs.data?.items.length === 1 ? rigs.data.items[0].id : "";
  const rigId = rigChoice ?? onlyRig;
  const [errors, setErrors] = useState<Errors>({});
  const [problem, setProblem] = useState<string | null>(null);

  const check = (): Errors => ({
    ...(name.trim() ? {} : { name: "Give the study a name." }),
    ...(caseId ? {} : { caseId: "Pick the case profile." }),
    ...(kitIds.length ? {} : { kitIds: "Pick at least one kit." }),
  });

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    const found = check();
    setErrors(found);
    if (Object.keys(found).length) return;
    setProblem(null);
    try {
      const item = await create.mutateAsync({ name: name.trim(), caseId, kitIds, rigId: rigId || null });
      router.push(`/studies/${item.id}`);
    } catch (error) {
      if (error instanceof ApiFailure && error.fields) setErrors(error.fields as Errors);
      setProblem(`${errorText(error)} Nothing was lost.`);
    }
  }

  const noLibrary = cases.data && kits.data && (cases.data.items.length === 0 || kits.data.items.length === 0);
  return (
    <form onSubmit={submit} noValidate className="card flex flex-col gap-4 p-5" aria-label="New study">
      <h2 className="text-lg font-semibold">New study</h2>
      {noLibrary ? (
        <FormNotice tone="error">
          A study needs a case profile and at least one kit in the library. <Link href="/library">Add them in the library</Link> first.
        </FormNotice>
      ) : null}
      {problem ? <FormNotice tone="error">{problem}</FormNotice> : null}
      <div className="grid gap-4 md:grid-cols-2">
        <div>
          <label htmlFor="ns-name" className="field-label">
            Name
          </label>
          <input id="ns-name" className="field-input" value={name} onChange={(e) => setName(e.target.value)} aria-invalid={errors.name ? true : undefined} />
          {errors.name ? <p className="field-error">{errors.name}</p> : null}
        </div>
        <div>
          <label htmlFor="ns-case" className="field-label">
            Case profile
          </label>
          <select id="ns-case" className="field-input" value={caseId} onChange={(e) => setCaseId(e.target.value)} aria-invalid={errors.caseId ? true : undefined}>
            <option value="">choose…</option>
            {cases.data?.items.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name}
              </option>
            ))}
          </select>
          {errors.caseId ? <p className="field-error">{errors.caseId}</p> : null}
        </div>
        <fieldset className="md:col-span-2">
          <legend className="field-label">Candidate kits</legend>
          <div className="mt-1 grid gap-1 sm:grid-cols-2 lg:grid-cols-3">
            {kits.data?.items.map((k) => (
              <label key={k.id} className="flex items-center gap-2 text-sm">
                <input
                  type="checkbox"
                  checked={kitIds.includes(k.id)}
                  onChange={(e) => setKitIds(e.target.checked ? [...kitIds, k.id] : kitIds.filter((x) => x !== k.id))}
                />
                {k.name}
              </label>
            ))}
          </div>
          {errors.kitIds ? <p className="field-error">{errors.kitIds}</p> : null}
        </fieldset>
        <div>
          <label htmlFor="ns-rig" className="field-label">
            Boring rig (optional)
          </label>
          <select id="ns-rig" className="field-input" value={rigId} onChange={(e) => setRigChoice(e.target.value)}>
            <option value="">none yet</option>
            {rigs.data?.items.map((r) => (
              <option key={r.id} value={r.id}>
                {r.name}
              </option>
            ))}
          </select>
        </div>
      </div>
      <div className="flex gap-2">
        <button type="submit" className="btn" disabled={create.isPending}>
          {create.isPending ? "Creating…" : "Create the study"}
        </button>
        <button type="button" className="btn-quiet" onClick={onCancel}>
          Cancel
        </button>
      </div>
    </form>
  );
}
