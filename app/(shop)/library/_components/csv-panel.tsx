"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { FormNotice } from "../../../_ui/field";
import { errorText } from "../../../_ui/query/fetch";
import { importLibraryCsv } from "../../../_ui/query/library/fetchers";
import { libraryKeys } from "../../../_ui/query/library/keys";
import type { CsvReport } from "../../../_ui/query/types";
import { CsvReportTable } from "./csv-report";
import { KIND_WORDS } from "./library-tabs";

const MAX_BYTES = 1_000_000;

/** Import from CSV: check every row first (nothing written), then write only the good rows when confirmed. */
export function CsvPanel({ kind }: { kind: "cases" | "kits" }) {
  const qc = useQueryClient();
  const [csv, setCsv] = useState<string | null>(null);
  const [fileName, setFileName] = useState("");
  const [report, setReport] = useState<CsvReport | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [written, setWritten] = useState<number | null>(null);
  const [busy, setBusy] = useState(false);
  const words = KIND_WORDS[kind];
  const good = report?.rows.filter((r) => r.ok).length ?? 0;

  async function check(text: string) {
    setBusy(true);
    setProblem(null);
    setWritten(null);
    try {
      setReport(await importLibraryCsv(kind, text, false));
    } catch (e) {
      setReport(null);
      setProblem(errorText(e));
    } finally {
      setBusy(false);
    }
  }

  async function confirm() {
    if (csv === null) return;
    setBusy(true);
    try {
      const r = await importLibraryCsv(kind, csv, true);
      setWritten(r.written);
      setReport(null);
      setCsv(null);
      setFileName("");
      await qc.invalidateQueries({ queryKey: libraryKeys.kind(kind) });
    } catch (e) {
      setProblem(errorText(e));
    } finally {
      setBusy(false);
    }
  }

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
        <input
          type="file"
          accept=".csv,text/csv"
          aria-label={`CSV file of ${words.plural}`}
          onChange={async (e) => {
            const file = e.target.files?.[0];
            if (!file) return;
            if (file.size > MAX_BYTES) {
              setProblem(`That file is ${Math.round(file.size / 1000)} kB; the import takes up to 1000 kB. Split it into smaller files.`);
              return;
            }
            const text = await file.text();
            setFileName(file.name);
            setCsv(text);
            await check(text);
          }}
        />
      </label>
      {problem ? <FormNotice tone="error">{problem}</FormNotice> : null}
      {written !== null ? (
        <FormNotice tone="ok">
          {written} {written === 1 ? words.one : words.plural} written.
        </FormNotice>
      ) : null}
      {report ? (
        <div className="flex flex-col gap-3">
          <p className="text-sm" role="status">
            {fileName}: <span className="num">{good}</span> good row{good === 1 ? "" : "s"}, <span className="num">{report.rows.length - good}</span> with
            problems. Nothing has been written yet.
          </p>
          <CsvReportTable report={report} />
          <div className="flex gap-2">
            <button type="button" className="btn" disabled={busy || good === 0} onClick={confirm}>
              Write the {good} good row{good === 1 ? "" : "s"}
            </button>
            <button
              type="button"
              className="btn-quiet"
              onClick={() => {
                setReport(null);
                setCsv(null);
              }}
            >
              Cancel
            </button>
          </div>
        </div>
      ) : null}
    </section>
  );
}
