"use client";

import { formatMoney } from "@/model/money-text";
import type { LengthUnits } from "@/geometry";
import { dateText } from "@/model/dates";
import { diameterLabel, lengthLabel } from "@/model/units";
import { createColumnHelper, type ColumnDef } from "@tanstack/react-table";
import type { ReactNode } from "react";
import type { CaseRow, KitRow, LibraryKind, RigRow, RowBase } from "../../../_ui/query/types";
import { changedColumn, nameColumn } from "../../../_ui/table/row-columns";

/** A shelf's columns: the row's name first, when it last changed last, and the shelf's own columns between. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- column value types differ per column
function shelfColumns<T extends RowBase>(kind: LibraryKind, zone: string, own: ColumnDef<T, any>[]): ColumnDef<T, unknown>[] {
  return [nameColumn<T>("Name", (r) => `/library/${kind}/${r.id}`), ...own, changedColumn<T>((at) => dateText(at, zone))] as ColumnDef<T, unknown>[];
}

const num = (text: string) => <span className="num">{text}</span>;

/** A length of the row's data, in the user's units; sortable by its id on the server. */
function lengthColumn<T>(id: string, header: string, get: (row: T) => number, units: LengthUnits) {
  return createColumnHelper<T>().accessor(get, { id, header, cell: (c) => num(lengthLabel(c.getValue(), units)) });
}

/** A column worked out from the whole row, not sortable. */
function shownColumn<T>(id: string, header: string, cell: (row: T) => ReactNode) {
  return createColumnHelper<T>().display({ id, header, cell: ({ row }) => cell(row.original) });
}

/** How many of something the row's data holds (studs, pockets, grooves). */
function countColumn<T>(id: string, header: string, count: (row: T) => number) {
  return shownColumn<T>(id, header, (row) => num(String(count(row))));
}

export function caseColumns(units: LengthUnits, zone: string): ColumnDef<CaseRow, unknown>[] {
  return shelfColumns<CaseRow>("cases", zone, [
    shownColumn<CaseRow>("mouth", "Mouth", (r) => {
      const o = r.data.mouth.outline;
      return o.kind === "circle" ? num(diameterLabel(o.diameterMm, units)) : <span>polygon, {o.pointsMm.length} corners</span>;
    }),
    countColumn<CaseRow>("studs", "Studs", (r) => r.data.studs.length),
    lengthColumn<CaseRow>("stockBoreMm", "Stock bore", (r) => r.data.stockBoreMm, units),
    lengthColumn<CaseRow>("strokeMm", "Stroke", (r) => r.data.strokeMm, units),
    countColumn<CaseRow>("pockets", "Pockets", (r) => r.data.pockets?.length ?? 0),
  ]);
}

export function kitColumns(units: LengthUnits, zone: string): ColumnDef<KitRow, unknown>[] {
  return shelfColumns<KitRow>("kits", zone, [
    lengthColumn<KitRow>("boreMm", "Bore", (r) => r.data.boreMm, units),
    shownColumn<KitRow>("skirt", "Skirt ⌀ (largest)", (row) => {
      const r = row.data.skirtDiameterReadingsMm;
      return (
        <span className="num">
          {lengthLabel(Math.max(...r), units)} <span className="text-ink-3">({r.length} reading{r.length === 1 ? "" : "s"})</span>
        </span>
      );
    }),
    countColumn<KitRow>("studs", "Studs", (r) => r.data.studs.length),
    createColumnHelper<KitRow>().accessor((r) => r.data.price?.amountMinor, { id: "price", header: "Price", cell: (c) => num(c.row.original.data.price ? formatMoney(c.row.original.data.price) : "—") }),
  ]);
}

export function rigColumns(units: LengthUnits, zone: string): ColumnDef<RigRow, unknown>[] {
  return shelfColumns<RigRow>("rigs", zone, [
    lengthColumn<RigRow>("headDiameterMm", "Head ⌀", (r) => r.data.headDiameterMm, units),
    shownColumn<RigRow>("reach", "Calibrated reach", (r) => num(`${lengthLabel(r.data.calibration.minCutDiameterMm, units)} – ${lengthLabel(r.data.calibration.maxCutDiameterMm, units)}`)),
    countColumn<RigRow>("grooves", "Grooves", (r) => r.data.grooves.length),
    shownColumn<RigRow>("rpm", "Drill top speed", (r) => num(`${r.data.drillTopRpm} rpm`)),
  ]);
}
