import type { StudyResult } from "@/geometry";
import { fromUnits, lengthLabel, tickText, toUnits, type LengthUnits } from "@/model/units";
import { VERDICT } from "./verdict-words";
import type { LineupRow } from "./lineup-rows";
import { blockingReason } from "./reasons";
import { VERDICT_COLOURS } from "@/model/palette";
import { KeyLine } from "@/app/_ui/studio/legend";

// The bars take the verdicts' own colours and glyphs (model/palette.ts), not the clearance bands'.
const colour = (verdict: keyof typeof VERDICT_COLOURS) => `var(--color-${VERDICT_COLOURS[verdict].token})`;
const ROW_H = 34;
const LEFT = 190;
const RIGHT = 330;
const WIDTH = 1000;

/** Tick positions (in mm) at a round step of the display unit. */
function ticks(minMm: number, maxMm: number, units: LengthUnits): number[] {
  const toU = (mm: number) => toUnits(mm, units);
  const span = toU(maxMm) - toU(minMm);
  const raw = span / 6;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((m) => m * mag).find((s) => s >= raw) ?? 10 * mag;
  const out: number[] = [];
  for (let v = Math.ceil(toU(minMm) / step) * step; v <= toU(maxMm) + 1e-9; v += step) out.push(fromUnits(v, units));
  return out;
}

type Scale = { x: (mm: number) => number; top: number; axisY: number; height: number; d0: number; d1: number };

/** Where each figure sits across the chart: the span of every bar end, mark and reach, padded, and the rows' heights. */
function chartScale(all: number[], rowCount: number): Scale {
  const lo = Math.min(...all);
  const hi = Math.max(...all);
  const pad = Math.max(1, (hi - lo) * 0.08);
  const d0 = lo - pad;
  const d1 = hi + pad;
  const top = 28;
  return {
    x: (mm: number) => LEFT + ((mm - d0) / (d1 - d0)) * (WIDTH - LEFT - RIGHT),
    top,
    axisY: top + rowCount * ROW_H + 6,
    height: top + rowCount * ROW_H + 46,
    d0,
    d1,
  };
}

/**
 * The cut window of each kit: a bar from the cut diameter the kit needs to the largest cut the case takes
 * at the minimum wall, with the existing mouth and the rig's reach marked. Drawn from the core's numbers only.
 */
export function WindowChart({
  rows,
  result,
  mouthDiameterMm,
  units,
}: {
  rows: LineupRow[];
  result: StudyResult;
  mouthDiameterMm: number | null;
  units: LengthUnits;
}) {
  if (rows.length === 0) return null;
  const reach = rows.find((r) => r.kit.rig)?.kit.rig?.bitReachMm ?? null;
  const starts = rows.map((r) => r.needDiameterMm ?? r.kit.skirt.diameterMm);
  const ends = rows.map((r) => r.kit.maxCutDiameterMm);
  const all = [...starts, ...ends, ...(mouthDiameterMm ? [mouthDiameterMm] : []), ...(reach ? [reach.min, reach.max] : [])].filter(Number.isFinite);
  const scale = chartScale(all, rows.length);
  const { x, top, axisY } = scale;

  return (
    <figure className="card flex flex-col gap-2 p-4" aria-label="Cut window chart" data-testid="window-chart">
      <figcaption className="flex flex-wrap items-baseline justify-between gap-2">
        <span className="font-semibold">Cut window per kit</span>
        <span className="text-xs text-ink-2">
          Bar: from the cut the kit needs to the largest cut this case takes at the minimum wall ({lengthLabel(result.limits.values.minWallMm, units)}, sealing land{" "}
          {lengthLabel(result.limits.values.minSealingLandMm, units)}).
        </span>
      </figcaption>
      <svg viewBox={`0 0 ${WIDTH} ${scale.height}`} className="w-full" role="img" aria-label="Cut window of each kit against the case">
        {reach ? (
          <g>
            <rect x={x(reach.min)} y={top - 6} width={Math.max(1, x(reach.max) - x(reach.min))} height={rows.length * ROW_H + 6} fill="var(--color-accent-soft)" opacity={0.55} />
            <text x={x(reach.min) + 3} y={top - 10} fontSize="11" fill="var(--color-accent)">
              rig reach {lengthLabel(reach.min, units)} – {lengthLabel(reach.max, units)}
            </text>
          </g>
        ) : null}
        {mouthDiameterMm ? (
          <g>
            <line x1={x(mouthDiameterMm)} x2={x(mouthDiameterMm)} y1={top - 6} y2={axisY} stroke="var(--color-ink-2)" strokeDasharray="4 3" />
            <text x={x(mouthDiameterMm) - 3} y={top - 10} fontSize="11" textAnchor="end" fill="var(--color-ink-2)">
              existing mouth {lengthLabel(mouthDiameterMm, units)}
            </text>
          </g>
        ) : null}
        {rows.map((r, i) => (
          <WindowRow key={r.kitId} row={r} y={top + i * ROW_H} needMm={starts[i]} maxMm={ends[i]} x={x} units={units} />
        ))}
        <WindowAxis scale={scale} units={units} />
      </svg>
      <WindowLegend />
    </figure>
  );
}

/** One kit's bar: from the cut it needs to the largest the case takes, dashed when it needs more than that; its verdict and words beside it. */
function WindowRow({ row: r, y, needMm: need, maxMm: max, x, units }: { row: LineupRow; y: number; needMm: number; maxMm: number; x: Scale["x"]; units: LengthUnits }) {
  const v = VERDICT[r.kit.verdict];
  const fits = need <= max;
  const a = x(Math.min(need, max));
  const b = x(Math.max(need, max));
  const blocked = blockingReason(r.kit);
  const words = blocked
    ? blocked
    : r.needDiameterMm === null
      ? `no cut needed · case takes up to ${lengthLabel(max, units)}`
      : fits
        ? `needs ${lengthLabel(need, units)} · window ${lengthLabel(max - need, units)}`
        : `needs ${lengthLabel(need, units)} · ${lengthLabel(need - max, units)} past the limit`;
  return (
    <g data-testid="window-row">
      <text x={LEFT - 10} y={y + ROW_H / 2 + 4} fontSize="12" textAnchor="end" fill="var(--color-ink)">
        <title>{r.name}</title>
        {r.name.length > 26 ? `${r.name.slice(0, 25)}…` : r.name}
      </text>
      <rect
        x={a}
        y={y + 8}
        width={Math.max(3, b - a)}
        height={ROW_H - 16}
        rx={3}
        fill={colour(r.kit.verdict)}
        opacity={fits ? 0.85 : 0.35}
        stroke={colour(r.kit.verdict)}
        strokeDasharray={fits ? undefined : "3 2"}
      />
      <line x1={x(need)} x2={x(need)} y1={y + 4} y2={y + ROW_H - 4} stroke={colour(r.kit.verdict)} strokeWidth={2} />
      {/* Two short lines, so the words stay inside the chart's right margin (about 50 characters at 11 px). */}
      <text x={WIDTH - RIGHT + 12} y={y + ROW_H / 2 - 2} fontSize="11" fill="var(--color-ink-2)">
        <title>{`${v.short}: ${words}`}</title>
        <tspan fontWeight={600}>
          {VERDICT_COLOURS[r.kit.verdict].icon} {v.short}
        </tspan>
        <tspan x={WIDTH - RIGHT + 12} dy={13}>
          {words.length > 48 ? `${words.slice(0, 47)}…` : words}
        </tspan>
      </text>
    </g>
  );
}

/** The cut-diameter axis under the bars, ticked at a round step of the user's unit. */
function WindowAxis({ scale: { x, axisY, d0, d1 }, units }: { scale: Scale; units: LengthUnits }) {
  return (
    <>
      <line x1={LEFT} x2={WIDTH - RIGHT} y1={axisY} y2={axisY} stroke="var(--color-rule)" />
      {ticks(d0, d1, units).map((t) => (
        <g key={t}>
          <line x1={x(t)} x2={x(t)} y1={axisY} y2={axisY + 4} stroke="var(--color-ink-3)" />
          <text x={x(t)} y={axisY + 16} fontSize="10" textAnchor="middle" fill="var(--color-ink-3)" className="num">
            {tickText(t, units)}
          </text>
        </g>
      ))}
      <text x={WIDTH - RIGHT} y={axisY + 30} fontSize="10" textAnchor="end" fill="var(--color-ink-3)">
        cut diameter, {units}
      </text>
    </>
  );
}

function WindowLegend() {
  return (
    <ul className="flex flex-wrap gap-4 text-xs text-ink-2" aria-label="Legend">
      {(["fits-as-is", "fits-after-cut", "cannot-fit"] as const).map((verdict) => (
        <KeyLine key={verdict} meaning={VERDICT_COLOURS[verdict]} />
      ))}
      <li className="flex items-center gap-1">
        <span className="inline-block h-3 w-5 border-l-2 border-dashed border-ink-2" /> existing mouth
      </li>
      <li className="flex items-center gap-1">
        <span className="inline-block h-3 w-5 bg-accent-soft" /> reach of the rig&apos;s bit
      </li>
    </ul>
  );
}
