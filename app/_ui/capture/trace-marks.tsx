import { useMemo } from "react";
import { orderAsRectangle, type Point } from "@/geometry/homography";
import type { Mode } from "./use-trace-reference";
import type { Traced, TracedPoints } from "./trace-shapes";

// What is traced, drawn over the photo in its pixels: the reference points (numbered, joined as the
// rectangle they stand for), the studs, and each outline, in the warning colour while it is not valid.

const OK = "var(--color-accent)";
const BAD = "var(--color-error)";
const REF = "var(--color-accent)";

type Sizes = { r: number; stroke: number };

function Ring({ pts, color, closed, s }: { pts: Point[]; color: string; closed: boolean; s: Sizes }) {
  if (pts.length < 2) return null;
  const points = pts.map((p) => p.join(",")).join(" ");
  return closed && pts.length > 2 ? <polygon points={points} fill="none" stroke={color} strokeWidth={s.stroke} /> : <polyline points={points} fill="none" stroke={color} strokeWidth={s.stroke} />;
}

function Dots({ pts, color, s, labels = false }: { pts: Point[]; color: string; s: Sizes; labels?: boolean }) {
  const { r, stroke } = s;
  return pts.map((p, i) => (
    <g key={i}>
      <circle cx={p[0]} cy={p[1]} r={r} fill="none" stroke={color} strokeWidth={stroke} />
      <line x1={p[0] - r * 1.6} y1={p[1]} x2={p[0] + r * 1.6} y2={p[1]} stroke={color} strokeWidth={stroke / 2} />
      <line x1={p[0]} y1={p[1] - r * 1.6} x2={p[0]} y2={p[1] + r * 1.6} stroke={color} strokeWidth={stroke / 2} />
      {labels ? (
        <text x={p[0] + r * 1.8} y={p[1] - r * 1.2} fontSize={r * 2.6} fill={color} stroke="white" strokeWidth={stroke / 2} paintOrder="stroke">
          {i + 1}
        </text>
      ) : null}
    </g>
  ));
}

type Props = { photoSizePx: number; mode: Mode; refPx: Point[]; points: TracedPoints; traced: Traced | null; cursor: Point | null };

export function TraceMarks({ photoSizePx, mode, refPx, points, traced, cursor }: Props) {
  const s: Sizes = { r: photoSizePx / 160, stroke: photoSizePx / 500 };
  const refRing = useMemo(() => {
    if (refPx.length !== 4) return refPx;
    try {
      return orderAsRectangle(refPx);
    } catch {
      // Four points that make no rectangle (two coincide, three in a line): the reference panel says so and
      // refuses the scale; here they are drawn joined in the order they were clicked.
      return refPx;
    }
  }, [refPx]);
  const deckColor = traced?.deckBad ? BAD : OK;
  const mouthColor = traced?.mouthBad ? BAD : OK;
  return (
    <>
      <Ring pts={mode === "rectangle" ? [...refRing] : refPx} color={REF} closed={mode === "rectangle"} s={s} />
      <Dots pts={refPx} color={REF} s={s} labels />
      <Dots pts={points.studs} color={OK} s={s} />
      <Ring pts={points.deck} color={deckColor} closed s={s} />
      <Dots pts={points.deck} color={deckColor} s={s} />
      {points.mouthRound ? null : <Ring pts={points.mouth} color={mouthColor} closed s={s} />}
      <Dots pts={points.mouth} color={mouthColor} s={s} />
      {points.passages.map((p, i) => (
        <g key={i}>
          <Ring pts={p} color={traced?.passageBad[i] ? BAD : OK} closed s={s} />
          <Dots pts={p} color={traced?.passageBad[i] ? BAD : OK} s={s} />
        </g>
      ))}
      {cursor ? <Dots pts={[cursor]} color="var(--color-ink)" s={s} /> : null}
    </>
  );
}
