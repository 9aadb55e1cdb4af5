"use client";

import { useState } from "react";
import { FormNotice } from "../../../_ui/field";
import { NewStudyForm } from "./new-study-form";
import { ImportStudy } from "./import-study";
import { StudiesTable } from "./studies-table";

/** The studies list with its two ways in: a new study from the library, or a study file. */
export function StudiesView() {
  const [open, setOpen] = useState<"new" | "import" | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap gap-2">
        <button type="button" className="btn" aria-expanded={open === "new"} onClick={() => setOpen(open === "new" ? null : "new")}>
          New study
        </button>
        <button type="button" className="btn-quiet" aria-expanded={open === "import"} onClick={() => setOpen(open === "import" ? null : "import")}>
          Import a study file
        </button>
      </div>
      {open === "new" ? <NewStudyForm onCancel={() => setOpen(null)} /> : null}
      {open === "import" ? <ImportStudy /> : null}
      {problem ? <FormNotice tone="error">{problem}</FormNotice> : null}
      <StudiesTable onProblem={setProblem} onNew={() => setOpen("new")} />
    </div>
  );
}
