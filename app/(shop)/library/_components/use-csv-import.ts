"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { errorText } from "../../../_ui/query/fetch";
import { importLibraryCsv } from "../../../_ui/query/library/fetchers";
import { libraryKeys } from "../../../_ui/query/library/keys";
import type { CsvReport } from "../../../_ui/query/types";

const MAX_BYTES = 1_000_000;

/** A library CSV import in two steps: a chosen file is checked row by row (nothing written), then its good rows are written once confirmed. */
export function useCsvImport(kind: "cases" | "kits") {
  const qc = useQueryClient();
  const [csv, setCsv] = useState<string | null>(null);
  const [fileName, setFileName] = useState("");
  const [report, setReport] = useState<CsvReport | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [written, setWritten] = useState<number | null>(null);
  const [busy, setBusy] = useState(false);

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

  async function choose(file: File | undefined) {
    if (!file) return;
    if (file.size > MAX_BYTES) {
      setProblem(`That file is ${Math.round(file.size / 1000)} kB; the import takes up to 1000 kB. Split it into smaller files.`);
      return;
    }
    const text = await file.text();
    setFileName(file.name);
    setCsv(text);
    await check(text);
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

  function cancel() {
    setReport(null);
    setCsv(null);
  }

  return { fileName, report, problem, written, busy, choose, confirm, cancel };
}
