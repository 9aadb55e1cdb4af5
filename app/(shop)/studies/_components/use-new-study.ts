"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiFailure, errorText } from "../../../_ui/query/fetch";
import { useLibraryOptions } from "../../../_ui/query/library/use-library-list";
import { useStudyActions } from "../../../_ui/query/studies/use-studies";

export type NewStudyErrors = Partial<Record<"name" | "caseId" | "kitIds", string>>;

/** The new-study form's state: the library to choose from, the choices, what is missing, and the create. */
export function useNewStudy() {
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
  const [errors, setErrors] = useState<NewStudyErrors>({});
  const [problem, setProblem] = useState<string | null>(null);

  const check = (): NewStudyErrors => ({
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
      // The server's refusal is shown next to its fields and above the form; what was chosen stays.
      if (error instanceof ApiFailure && error.fields) setErrors(error.fields as NewStudyErrors);
      setProblem(`${errorText(error)} Nothing was lost.`);
    }
  }

  const noLibrary = Boolean(cases.data && kits.data && (cases.data.items.length === 0 || kits.data.items.length === 0));
  return { cases, kits, rigs, name, setName, caseId, setCaseId, kitIds, setKitIds, rigId, setRigChoice, errors, problem, noLibrary, submit, creating: create.isPending };
}
