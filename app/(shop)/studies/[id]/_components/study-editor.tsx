"use client";

import type { LengthUnits } from "@/geometry";
import Link from "next/link";
import { useState } from "react";
import { EmptyState } from "../../../../_ui/empty-state";
import { errorText } from "../../../../_ui/query/fetch";
import { useStudy } from "../../../../_ui/query/studies/use-study";
import { StudyWorkspace } from "./study-workspace";

/** Loads the study (already in the cache from the server render) and opens the workspace on it. */
export function StudyEditor({ id, units }: { id: string; units: LengthUnits }) {
  const study = useStudy(id);
  const [generation, setGeneration] = useState(0);
  if (study.isPending) return <p className="text-ink-2">Loading the study…</p>;
  if (study.isError)
    return (
      <EmptyState title="The study could not be loaded" action={<Link href="/studies" className="btn no-underline">Back to the studies</Link>}>
        {errorText(study.error)}
      </EmptyState>
    );
  return <StudyWorkspace key={generation} detail={study.data} initialUnits={units} onReloaded={() => setGeneration((g) => g + 1)} />;
}
