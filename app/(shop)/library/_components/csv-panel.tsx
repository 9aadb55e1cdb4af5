"use client";

import { FormNotice } from "../../../_ui/field";
import type { CsvReport } from "../../../_ui/query/types";
import { CsvReportTable } from "./csv-report";
import { KIND_WORDS } from "./library-tabs";
import { useCsvImport } from "./use-csv-import";

/** Import from CSV: check every row first (nothing written), then write only the good rows when confirmed. */
export function CsvPanel({ kind }: { kind: "cases" | "kits" }) {
  const { fileName, report, problem, written, busy, choose, confirm, cancel } = useCsvImport(kind);
  const words = KIND_WORDS[kind];
  return (
    <section className="card flex flex-col gap-4 p-5" aria-label={`Import and export ${words.plural}`}>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 className="text-base font-semibold">Import and export {words.plural} (CSV)</h2>
        <div className="flex gap-2">
          <a className="btn-quiet no-underline" href={`/api/v1/library/template?kind=${kind}`} download>
            Download the template
          </a>
          <a className="btn-quiet no-underline" href={`/api/v1/library/export?kind=${kind}`} download>
            Export all {words.plural}
          </a>
        </div>
      </div>
      <p className="text-sm text-ink-2">
        Fill in the template (one {words.one} a row, lengths in mm, a point for decimals), then choose the file. Every row is checked first and nothing is
        written until you confirm the good rows.
      </p>
      <label className="flex flex-wrap items-center gap-3 text-sm">
        <span className="field-label">CSV file</span>
        <input type="file" accept=".csv,text/csv" aria-label={`CSV file of ${words.plural}`} onChange={(e) => choose(e.target.files?.[0])} />
      </label>
      {problem ? <FormNotice tone="error">{problem}</FormNotice> : null}
      {written !== null ? (
        <FormNotice tone="ok">
          {written} {written === 1 ? words.one : words.plural} written.
        </FormNotice>
      ) : null}
      {report ? <CsvPreview fileName={fileName} report={report} busy={busy} onConfirm={confirm} onCancel={cancel} /> : null}
    </section>
  );
}

/** The checked file before anything is written: how many rows are good, each row's problems, write or cancel. */
function CsvPreview({ fileName, report, busy, onConfirm, onCancel }: { fileName: string; report: CsvReport; busy: boolean; onConfirm: () => void; onCancel: () => void }) {
  const good = report.rows.filter((r) => r.ok).length;
  return (
    <div className="flex flex-col gap-3">
      <p className="text-sm" role="status">
        {fileName}: <span className="num">{good}</span> good row{good === 1 ? "" : "s"}, <span className="num">{report.rows.length - good}</span> with
        problems. Nothing has been written yet.
      </p>
      <CsvReportTable report={report} />
      <div className="flex gap-2">
        <button type="button" className="btn" disabled={busy || good === 0} onClick={onConfirm}>
          Write the {good} good row{good === 1 ? "" : "s"}
        </button>
        <button type="button" className="btn-quiet" onClick={onCancel}>
          Cancel
        </button>
      </div>
    </div>
  );
}
