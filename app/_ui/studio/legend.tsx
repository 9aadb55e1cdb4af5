import { memo } from "react";
import { bandRanges, FIT, wallLowRange, type Meaning } from "@/model/palette";
import type { LengthUnits } from "@/model/units";

/**
 * A meaning's swatch: its colour (the theme's, through the stylesheet) and its shape drawn into it, so the
 * key reads the same in black and white. Lines are drawn, not patterned, so a page with many swatches has no ids.
 */
export function Swatch({ meaning, className = "" }: { meaning: Meaning; className?: string }) {
  const c = `var(--color-${meaning.token})`;
  const soft = `var(--color-${meaning.token}-soft)`;
  const diag = [-8, -4, 0, 4, 8, 12].map((o) => `M${o} 12L${o + 12} 0`).join("");
  const back = [-8, -4, 0, 4, 8, 12].map((o) => `M${o} 0L${o + 12} 12`).join("");
  let inner;
  switch (meaning.shape) {
    case "cross-hatch":
      inner = <path d={diag + back} stroke={c} strokeWidth={1.2} />;
      break;
    case "hatch":
      inner = <path d={diag} stroke={c} strokeWidth={1.4} />;
      break;
    case "dots":
      inner = [3, 8, 13].flatMap((x) => [3, 9].map((y) => <circle key={`${x},${y}`} cx={x} cy={y} r={1.3} fill={c} />));
      break;
    case "thick-dash":
      inner = <path d="M0 6H16" stroke={c} strokeWidth={4} strokeDasharray="4 2" />;
      break;
    default:
      inner = null;
  }
  const dash = meaning.shape === "dashed-outline" ? "3 1.5" : meaning.shape === "dash-dot-outline" ? "3 1 1 1" : meaning.shape === "dotted-outline" ? "1 1.2" : undefined;
  const ground = meaning.shape === "thick-dash" ? "none" : soft;
  return (
    <svg viewBox="0 0 16 12" className={`inline-block h-3 w-4 shrink-0 ${className}`} aria-hidden focusable="false" data-swatch={meaning.token}>
      <rect x={0.75} y={0.75} width={14.5} height={10.5} rx={1.5} fill={ground} stroke={meaning.shape === "thick-dash" ? "none" : c} strokeWidth={1.5} strokeDasharray={dash} />
      <svg x={0.75} y={0.75} width={14.5} height={10.5} viewBox="0 0 16 12" overflow="hidden">
        {inner}
      </svg>
    </svg>
  );
}

/** One line of a key: the swatch, the glyph, the name in the meaning's colour, the range and the words. */
export function KeyLine({ meaning, range, words }: { meaning: Meaning; range?: string; words?: string }) {
  return (
    <li className="flex items-start gap-2" data-meaning={meaning.token}>
      <Swatch meaning={meaning} className="mt-0.5" />
      <span>
        <span aria-hidden>{meaning.icon} </span>
        <b style={{ color: `var(--color-${meaning.token})` }}>{meaning.name}</b>
        {range ? <span className="num"> ({range})</span> : null}: {words ?? meaning.words}
      </span>
    </li>
  );
}

/** What each colour of the 3D view and the drawings means, with the shop's numbers (ranges that meet without overlapping). */
export const Legend = memo(function Legend({ minClearanceMm, minWallMm, ports, units, large }: { minClearanceMm: number; minWallMm: number; ports: boolean; units: LengthUnits; large: boolean }) {
  const ranges = bandRanges(minClearanceMm, units);
  return (
    <div className={`card p-3 ${large ? "text-base" : "text-xs"}`} aria-label="Colour key" role="group" data-testid="legend">
      <ul className="flex flex-col gap-1.5">
        <KeyLine meaning={FIT.interfere} range={ranges.interfere} words="the skirt overlaps case material; that material is drawn solid" />
        <KeyLine meaning={FIT.tight} range={ranges.tight} />
        <KeyLine meaning={FIT.clear} range={ranges.clear} />
        <KeyLine meaning={FIT.counterbore} />
        <KeyLine meaning={FIT.removed} words="case material the counterbore takes away (in the section)" />
        <KeyLine meaning={FIT.wallLow} range={wallLowRange(minWallMm, units)} />
        <KeyLine meaning={FIT.passage} />
        {ports ? <KeyLine meaning={FIT.port} /> : null}
      </ul>
    </div>
  );
});
