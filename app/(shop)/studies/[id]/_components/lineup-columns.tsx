"use client";

import type { LengthUnits } from "@/geometry";
import { createColumnHelper, type ColumnDef, type SortingFn } from "@tanstack/react-table";
import { lengthLabel } from "@/model/units";
import type { Money } from "@/model/money";
import { formatMoney } from "@/model/money-text";
import { VerdictGlyph } from "@/app/_ui/studio/verdict-mark";
import { TONE_TEXT, VERDICT } from "./verdict-words";
import type { LineupRow } from "./lineup-rows";
import { blockingReason } from "./reasons";
import { TERM } from "@/model/glossary";

// The lineup's columns, each kit's figures from the core's result; the cells only write them.

const h = createColumnHelper<LineupRow>();
const VERDICT_ORDER = { "fits-as-is": 0, "fits-after-cut": 1, "cannot-fit": 2 } as const;
/** Numbers sort with the missing ones last, whichever way. */
const nullsLast =
  (get: (r: LineupRow) => number | null): SortingFn<LineupRow> =>
  (a, b) => {
    const x = get(a.original);
    const y = get(b.original);
    if (x === null && y === null) return 0;
    if (x === null) return 1;
    if (y === null) return -1;
    return x - y;
  };

/** The lineup's columns: the choice, the kit, its verdict, the least cut, the thinnest wall, the rig, the displacement and the price. */
export function lineupColumns(units: LengthUnits, chosen: string, onChoose: (kitId: string) => void): ColumnDef<LineupRow, unknown>[] {
  return [
    h.display({
      id: "choice",
      header: "Choice",
      cell: ({ row }) => (
        <label className="flex items-center gap-1 text-sm">
          <input type="radio" name="lineup-choice" checked={chosen === row.original.kitId} onChange={() => onChoose(row.original.kitId)} aria-label={`Choose ${row.original.name}`} />
          {chosen === row.original.kitId ? <span className="text-accent">chosen</span> : null}
        </label>
      ),
    }),
    h.accessor("name", { id: "name", header: "Kit", cell: (c) => <span className="font-medium">{c.getValue()}</span> }),
    h.accessor((r) => VERDICT_ORDER[r.kit.verdict], {
      id: "verdict",
      header: "Verdict",
      cell: ({ row }) => <VerdictCell row={row.original} />,
    }),
    h.accessor("needDiameterMm", {
      id: "needDiameter",
      header: `${TERM.leastCut.short} ⌀`,
      sortingFn: nullsLast((r) => r.needDiameterMm),
      cell: (c) => <span className="num">{c.getValue() === null ? "none" : lengthLabel(c.getValue(), units)}</span>,
    }),
    h.accessor("needDepthMm", {
      id: "needDepth",
      header: TERM.cutDepth.short,
      sortingFn: nullsLast((r) => r.needDepthMm),
      cell: (c) => <span className="num">{c.getValue() === null ? "—" : lengthLabel(c.getValue(), units)}</span>,
    }),
    h.accessor("thinnestWallMm", {
      id: "thinnestWall",
      header: TERM.thinnestWall.label,
      sortingFn: nullsLast((r) => r.thinnestWallMm),
      cell: ({ row }) => <ThinnestWallCell row={row.original} units={units} />,
    }),
    h.accessor("rigText", {
      id: "rig",
      header: "Rig",
      cell: ({ row }) => (
        <span className={row.original.rigOk === false ? "text-error" : row.original.rigOk ? "text-success" : "text-ink-2"}>{row.original.rigText}</span>
      ),
    }),
    h.accessor((r) => r.kit.displacementCc.kit, {
      id: "displacement",
      header: TERM.displacement.label,
      cell: ({ row }) => (
        <span className="num">
          {row.original.kit.displacementCc.kitRounded} cc{row.original.kit.displacementCc.crossesClasses.length ? <span className="text-caution"> ⚑ class</span> : null}
        </span>
      ),
    }),
    h.accessor("price", {
      id: "price",
      header: "Price",
      // Prices sort by amount; the kits of one study are priced in one currency as a rule.
      sortingFn: nullsLast((r) => r.price?.amountMinor ?? null),
      cell: (c) => <span className="num">{c.getValue() === null ? "—" : formatMoney(c.getValue() as Money)}</span>,
    }),
  ] as ColumnDef<LineupRow, unknown>[];
}

function VerdictCell({ row }: { row: LineupRow }) {
  const v = VERDICT[row.kit.verdict];
  const why = blockingReason(row.kit);
  return (
    <span className={`font-medium ${TONE_TEXT[v.tone]}`}>
      <VerdictGlyph verdict={row.kit.verdict} />
      {v.words}
      {why ? <span className="block text-xs font-normal text-ink-2">{why}</span> : null}
    </span>
  );
}

function ThinnestWallCell({ row, units }: { row: LineupRow; units: LengthUnits }) {
  const w = row.kit.thinnestWall;
  if (!w) return <span className="text-ink-3">no cut</span>;
  const cls = w.minWallMm < 0 ? "text-wall-low font-semibold" : w.ok ? "text-ink" : "text-wall-low";
  return (
    <span data-testid="thinnest-wall">
      <span className={`num ${cls}`}>{lengthLabel(w.minWallMm, units)}</span> <span className="text-ink-2">{row.thinnestWhere}</span>
    </span>
  );
}
