"use client";

import Link from "next/link";
import { useState } from "react";
import { FormNotice } from "../../../_ui/field";
import { ApiFailure, errorText } from "../../../_ui/query/fetch";
import { useStudyActions } from "../../../_ui/query/studies/use-studies";
import type { StudyRow } from "../../../_ui/query/types";

const MAX_BYTES = 1_000_000;

/** Import a study file (the JSON the fit command reads): a report of every wrong field, or the new study. */
export function ImportStudy() {
  const { importFile } = useStudyActions(() => undefined);
  const [report, setReport] = useState<{ message: string; fields: [string, string][] } | null>(null);
  const [done, setDone] = useState<StudyRow | null>(null);

  async function read(file: File) {
    setReport(null);
    setDone(null);
    if (file.size > MAX_BYTES) {
      setReport({ message: `That file is ${Math.round(file.size / 1000)} kB; a study file is at most 1000 kB.`, fields: [] });
      return;
    }
    let json: unknown;
    try {
      json = JSON.parse(await file.text());
    } catch (e) {
      setReport({ message: `${file.name} is not JSON: ${e instanceof Error ? e.message : "it could not be read"}. Nothing was written.`, fields: [] });
      return;
    }
    try {
      setDone(await importFile.mutateAsync(json));
    } catch (error) {
      setReport({
        message: `${file.name} was not imported: ${errorText(error)} Nothing was written.`,
        fields: error instanceof ApiFailure ? Object.entries(error.fields ?? {}) : [],
      });
    }
  }

  return (
    <section className="card flex flex-col gap-3 p-5" aria-label="Import a study file">
      <h2 className="text-lg font-semibold">Import a study file</h2>
      <p className="text-sm text-ink-2">
        A study exported from Borewright (or written for the fit command): the case, the kits and the rig become new library rows, and the study opens with
        them.
      </p>
      <label className="flex flex-wrap items-center gap-3 text-sm">
        <span className="field-label">Study file (.json)</span>
        <input type="file" accept=".json,application/json" aria-label="Study file" onChange={(e) => e.target.files?.[0] && read(e.target.files[0])} />
      </label>
      {importFile.isPending ? <p className="text-sm text-ink-2">Checking and importing…</p> : null}
      {done ? (
        <FormNotice tone="ok">
          Imported as <Link href={`/studies/${done.id}`}>{done.name}</Link>.
        </FormNotice>
      ) : null}
      {report ? (
        <FormNotice tone="error">
          <p>{report.message}</p>
          {report.fields.length ? (
            <ul className="mt-2 list-disc pl-5" aria-label="What is wrong in the file">
              {report.fields.map(([path, msg]) => (
                <li key={path}>
                  <span className="num">{path}</span>: {msg}
                </li>
              ))}
            </ul>
          ) : null}
        </FormNotice>
      ) : null}
    </section>
  );
}
