import type { LengthUnits, WallResult } from "@/geometry";
import { TERM } from "@/model/glossary";
import { lengthLabel } from "@/model/units";
import { HeadRow, type HeadColumn } from "../table/head-row";

const HEAD: readonly HeadColumn[] = ["Where", { label: "Left", className: "text-right" }, { label: "Required", className: "text-right" }, { label: "State", className: "pl-3" }];

const KIND: Record<WallResult["kind"], string> = { stud: TERM.sealingLand.short, pocket: TERM.wallToPocket.short, outline: TERM.wallToOutside.label };

/** The wall left from the cut to each stud hole, pocket and the deck's outside, against what is required. */
export function WallsTable({ walls, units }: { walls: WallResult[]; units: LengthUnits }) {
  if (walls.length === 0) return <p className="text-sm text-ink-2">No cut, so no wall is touched.</p>;
  return (
    <table className="w-full text-sm" aria-label="Walls left by the cut" data-testid="walls">
      <HeadRow className="text-left text-ink-2" cellClassName="py-1 font-medium" columns={HEAD} />
      <tbody>
        {walls.map((w) => {
          const broken = w.minWallMm < 0;
          const state = !w.reached ? ["not reached", "text-ink-3"] : w.ok ? ["ok", "text-ink-2"] : broken ? ["breaks through", "text-wall-low font-semibold"] : ["too thin", "text-wall-low"];
          return (
            <tr key={`${w.kind}-${w.label}`} className="border-t border-rule">
              <td className="py-1">
                {KIND[w.kind]} <span className="text-ink-2">{w.kind === "outline" ? "" : w.label}</span>
              </td>
              <td className={`py-1 text-right num ${state[1]}`}>{lengthLabel(w.minWallMm, units)}</td>
              <td className="py-1 text-right num text-ink-2">{lengthLabel(w.requiredMm, units)}</td>
              <td className={`py-1 pl-3 ${state[1]}`}>
                <span aria-hidden="true">{!w.reached ? "·" : w.ok ? "✓" : "✕"}</span> {state[0]}
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
