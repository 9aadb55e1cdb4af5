"use client";

import { CaseProfileSchema, evaluateStudy, safeParseStudy, type CaseProfile, type LengthUnits } from "@/geometry";
import { kitFromRow } from "@/model/study-assembly";
import { diameterLabel, lengthLabel } from "@/model/units";
import { useDeferredValue, useMemo, useRef, useState } from "react";
import { useFormContext, useWatch } from "react-hook-form";
import { useStore } from "zustand";
import { FormReader } from "@/app/_ui/form/form-reader";
import { useLibraryOptions } from "@/app/_ui/query/library/use-library-list";
import type { KitRow } from "@/app/_ui/query/types";
import { VERDICT_TEXT } from "@/app/_ui/studio/words";
import { caseToCore, mergeCase, type CaseFormValues } from "../case-values";
import type { ShapeStore } from "./shape-store";
import { RowOptions } from "@/app/_ui/form/row-options";

type Trial = { name: string; text: string; wall: string | null; ok: boolean };

/** Two kits at most are tried while the case is edited, so a drag stays smooth. */
const MAX_KITS = 2;

/** The least cut for the kit on this case, then the walls that cut leaves, by the same core the study runs. */
function trial(c: CaseProfile, row: KitRow, units: LengthUnits): Trial {
  const kit = kitFromRow(row);
  const first = safeParseStudy({ case: c, kits: [kit] });
  if (!first.ok) return { name: row.name, text: first.issues[0]?.message ?? "cannot be tried on this case", wall: null, ok: false };
  try {
    const k = evaluateStudy(first.study).kits[0];
    if (!k.leastCut) return { name: row.name, text: VERDICT_TEXT[k.verdict], wall: null, ok: k.verdict !== "cannot-fit" };
    const cut = { diameterMm: k.leastCut.diameterMm, depthMm: k.leastCut.depthMm };
    const withCut = safeParseStudy({ case: c, kits: [kit], cut });
    const r = withCut.ok ? evaluateStudy(withCut.study).kits[0] : k;
    const w = r.thinnestWall;
    return {
      name: row.name,
      text: `${VERDICT_TEXT[r.verdict]} · least cut ${diameterLabel(cut.diameterMm, units)} × ${lengthLabel(cut.depthMm, units)} deep`,
      wall: w ? `thinnest wall ${lengthLabel(w.minWallMm, units)} at ${w.label}` : null,
      ok: r.verdict !== "cannot-fit",
    };
  } catch (error) {
    // A shape the core refuses at evaluation (a degenerate outline) is shown as the reason, not thrown.
    return { name: row.name, text: error instanceof Error ? error.message : "cannot be evaluated", wall: null, ok: false };
  }
}

/**
 * The case as entered, tried against up to two kits of the library while it is edited: the least cut
 * each needs and the thinnest wall it leaves (to a passage, a stud hole, the deck edge).
 */
export function CaseTrial({ store }: { store: ShapeStore }) {
  const kits = useLibraryOptions("kits");
  const [ids, setIds] = useState<string[]>([]);
  // The trial follows every change, except in the middle of a drag (the history is paused then): it runs on the release.
  const settled = useRef(store.getState().doc);
  const doc = useDeferredValue(useStore(store, (s) => (store.temporal.getState().isTracking ? (settled.current = s.doc) : settled.current)));
  const units = useStore(store, (s) => s.units);
  const { control } = useFormContext<CaseFormValues>();
  const values = useWatch({ control }) as CaseFormValues;
  const rows = useMemo(() => (kits.data?.items ?? []) as KitRow[], [kits.data]);
  const chosen = useMemo(() => ids.flatMap((id) => rows.filter((r) => r.id === id)), [ids, rows]);
  const results = useMemo(() => {
    if (chosen.length === 0) return null;
    const read = new FormReader(units);
    const input = caseToCore(mergeCase(values, doc), read) as Record<string, unknown>;
    const parsed = CaseProfileSchema.safeParse({ ...input, name: String(input.name ?? "").trim() || "case" });
    if (read.issues.length || !parsed.success) return "incomplete" as const;
    return chosen.map((r) => trial(parsed.data, r, units));
  }, [chosen, values, doc, units]);
  if (rows.length === 0) return null;
  return (
    <section className="card flex flex-col gap-3 p-4" aria-label="Tried against kits">
      <h2 className="text-base font-semibold">Tried against kits</h2>
      <div className="flex flex-wrap gap-3">
        {Array.from({ length: MAX_KITS }, (_, i) => (
          <select
            key={i}
            className="rounded-md border border-rule bg-card px-2 py-1.5 text-sm"
            aria-label={`Kit ${i + 1} to try`}
            value={ids[i] ?? ""}
            onChange={(e) => setIds((now) => Object.assign([...now], { [i]: e.target.value }).filter(Boolean))}
          >
            <RowOptions rows={rows} empty="no kit" />
          </select>
        ))}
      </div>
      {results === "incomplete" ? <p className="text-sm text-ink-2">Complete the case (the fields marked in red) to try it.</p> : null}
      {Array.isArray(results) ? (
        <ul className="flex flex-col gap-2" data-testid="case-trial">
          {results.map((t) => (
            <li key={t.name} className="text-sm">
              <span className="font-medium">{t.name}</span>: <span className={t.ok ? "text-ink" : "text-verdict-cannot"}>{t.text}</span>
              {t.wall ? <span className="block text-ink-2 num">{t.wall}</span> : null}
            </li>
          ))}
        </ul>
      ) : null}
      <p className="text-xs text-ink-3">A first look only: the study checks the cut with the rig, the readings and the shop&apos;s limits. Follow the kit maker&apos;s instructions and local regulations.</p>
    </section>
  );
}
