"use client";

import { formatMoney } from "@/model/money-text";
import type { LengthUnits } from "@/geometry";
import { dateText } from "@/model/dates";
import { diameterLabel, lengthLabel } from "@/model/units";
import { createColumnHelper, type ColumnDef } from "@tanstack/react-table";
import type { CaseRow, KitRow, LibraryKind, RigRow, RowBase } from "../../../_ui/query/types";
import { changedColumn, nameColumn } from "../../../_ui/table/row-columns";

function common<T extends RowBase>(kind: LibraryKind, zone: string) {
  return { name: nameColumn<T>("Name", (r) => `/library/${kind}/${r.id}`), updated: changedColumn<T>((at) => dateText(at, zone)) };
}

const num = (text: string) => <span className="num">{text}</span>;

export function caseColumns(units: LengthUnits, zone: string): ColumnDef<CaseRow, unknown>[] {
  const h = createColumnHelper<CaseRow>();
  const c = common<CaseRow>("cases", zone);
  return [
    c.name,
    h.display({
      id: "mouth",
      header: "Mouth",
      cell: ({ row }) => {
        const o = row.original.data.mouth.outline;
        return o.kind === "circle" ? num(diameterLabel(o.diameterMm, units)) : <span>polygon, {o.pointsMm.length} corners</span>;
      },
    }),
    h.display({ id: "studs", header: "Studs", cell: ({ row }) => num(String(row.original.data.studs.length)) }),
    h.accessor((r) => r.data.stockBoreMm, { id: "stockBoreMm", header: "Stock bore", cell: (c) => num(lengthLabel(c.getValue(), units)) }),
    h.accessor((r) => r.data.strokeMm, { id: "strokeMm", header: "Stroke", cell: (c) => num(lengthLabel(c.getValue(), units)) }),
    h.display({ id: "pockets", header: "Pockets", cell: ({ row }) => num(String(row.original.data.pockets?.length ?? 0)) }),
    c.updated,
  ] as ColumnDef<CaseRow, unknown>[];
}

export function kitColumns(units: LengthUnits, zone: string): ColumnDef<KitRow, unknown>[] {
  const h = createColumnHelper<KitRow>();
  const c = common<KitRow>("kits", zone);
  return [
    c.name,
    h.accessor((r) => r.data.boreMm, { id: "boreMm", header: "Bore", cell: (c) => num(lengthLabel(c.getValue(), units)) }),
    h.display({
      id: "skirt",
      header: "Skirt ⌀ (largest)",
      cell: ({ row }) => {
        const r = row.original.data.skirtDiameterReadingsMm;
        return (
          <span className="num">
            {lengthLabel(Math.max(...r), units)} <span className="text-ink-3">({r.length} reading{r.length === 1 ? "" : "s"})</span>
          </span>
        );
      },
    }),
    h.display({ id: "studs", header: "Studs", cell: ({ row }) => num(String(row.original.data.studs.length)) }),
    h.accessor((r) => r.data.price?.amountMinor, { id: "price", header: "Price", cell: (c) => num(c.row.original.data.price ? formatMoney(c.row.original.data.price) : "—") }),
    c.updated,
  ] as ColumnDef<KitRow, unknown>[];
}

export function rigColumns(units: LengthUnits, zone: string): ColumnDef<RigRow, unknown>[] {
  const h = createColumnHelper<RigRow>();
  const c = common<RigRow>("rigs", zone);
  return [
    c.name,
    h.accessor((r) => r.data.headDiameterMm, { id: "headDiameterMm", header: "Head ⌀", cell: (c) => num(lengthLabel(c.getValue(), units)) }),
    h.display({
      id: "reach",
      header: "Calibrated reach",
      cell: ({ row }) => num(`${lengthLabel(row.original.data.calibration.minCutDiameterMm, units)} – ${lengthLabel(row.original.data.calibration.maxCutDiameterMm, units)}`),
    }),
    h.display({ id: "grooves", header: "Grooves", cell: ({ row }) => num(String(row.original.data.grooves.length)) }),
    h.display({ id: "rpm", header: "Drill top speed", cell: ({ row }) => num(`${row.original.data.drillTopRpm} rpm`) }),
    c.updated,
  ] as ColumnDef<RigRow, unknown>[];
}
