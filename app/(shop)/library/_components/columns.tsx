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

/** A length of the row's data, in the user's units; sortable by its id on the server. */
function lengthColumn<T>(id: string, header: string, get: (row: T) => number, units: LengthUnits) {
  return createColumnHelper<T>().accessor(get, { id, header, cell: (c) => num(lengthLabel(c.getValue(), units)) });
}

/** How many of something the row's data holds (studs, pockets, grooves). */
function countColumn<T>(id: string, header: string, count: (row: T) => number) {
  return createColumnHelper<T>().display({ id, header, cell: ({ row }) => num(String(count(row.original))) });
}

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
    countColumn<CaseRow>("studs", "Studs", (r) => r.data.studs.length),
    lengthColumn<CaseRow>("stockBoreMm", "Stock bore", (r) => r.data.stockBoreMm, units),
    lengthColumn<CaseRow>("strokeMm", "Stroke", (r) => r.data.strokeMm, units),
    countColumn<CaseRow>("pockets", "Pockets", (r) => r.data.pockets?.length ?? 0),
    c.updated,
  ] as ColumnDef<CaseRow, unknown>[];
}

export function kitColumns(units: LengthUnits, zone: string): ColumnDef<KitRow, unknown>[] {
  const h = createColumnHelper<KitRow>();
  const c = common<KitRow>("kits", zone);
  return [
    c.name,
    lengthColumn<KitRow>("boreMm", "Bore", (r) => r.data.boreMm, units),
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
    countColumn<KitRow>("studs", "Studs", (r) => r.data.studs.length),
    h.accessor((r) => r.data.price?.amountMinor, { id: "price", header: "Price", cell: (c) => num(c.row.original.data.price ? formatMoney(c.row.original.data.price) : "—") }),
    c.updated,
  ] as ColumnDef<KitRow, unknown>[];
}

export function rigColumns(units: LengthUnits, zone: string): ColumnDef<RigRow, unknown>[] {
  const h = createColumnHelper<RigRow>();
  const c = common<RigRow>("rigs", zone);
  return [
    c.name,
    lengthColumn<RigRow>("headDiameterMm", "Head ⌀", (r) => r.data.headDiameterMm, units),
    h.display({
      id: "reach",
      header: "Calibrated reach",
      cell: ({ row }) => num(`${lengthLabel(row.original.data.calibration.minCutDiameterMm, units)} – ${lengthLabel(row.original.data.calibration.maxCutDiameterMm, units)}`),
    }),
    countColumn<RigRow>("grooves", "Grooves", (r) => r.data.grooves.length),
    h.display({ id: "rpm", header: "Drill top speed", cell: ({ row }) => num(`${row.original.data.drillTopRpm} rpm`) }),
    c.updated,
  ] as ColumnDef<RigRow, unknown>[];
}
