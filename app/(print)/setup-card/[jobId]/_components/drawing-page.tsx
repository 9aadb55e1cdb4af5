import type { CardDrawing, CardVerdict } from "@/db/setup-card";
import { EveryPage } from "./card-verdict";

/** One drawing on a landscape page of its own, at its stated scale, with the bar to check the print by. */
export function DrawingPage({ drawing: d, page, reference, verdict }: { drawing: CardDrawing; page: number; reference: string; verdict: CardVerdict }) {
  const w = d.widthMm * d.scale;
  const h = d.heightMm * d.scale;
  // The drawing's own size attributes are its true size in mm; on the page it is printed at its scale.
  const svg = d.svg.replace(/^<svg([^>]*?) width="[^"]*" height="[^"]*"/, `<svg$1 width="${w.toFixed(3)}mm" height="${h.toFixed(3)}mm"`);
  return (
    <section className="sheet-page" data-testid="drawing-page" data-scale={d.scale} data-width-mm={w.toFixed(3)}>
      <EveryPage verdict={verdict} />
      <h2>
        {d.title} — {reference}, page {page}
      </h2>
      <figure aria-label={d.title} dangerouslySetInnerHTML={{ __html: svg }} />
      <div className="scale-row">
        <ScaleBar barMm={d.barMm * d.scale} label={d.barLabel} />
        <span className="num">{d.barLabel}</span>
        <span>{d.caption}</span>
      </div>
    </section>
  );
}

/** The printed scale bar, `barMm` long on paper: one half filled, one half open, to measure the print by. */
function ScaleBar({ barMm: bar, label }: { barMm: number; label: string }) {
  return (
    <svg className="scale-bar" width={`${bar.toFixed(3)}mm`} height="4mm" viewBox={`0 0 ${bar.toFixed(3)} 4`} role="img" aria-label={`Scale bar: ${label}`}>
      <rect x="0" y="0.5" width={bar.toFixed(3)} height="1.6" fill="#2b2f33" />
      <rect x={(bar / 2).toFixed(3)} y="0.5" width={(bar / 2).toFixed(3)} height="1.6" fill="#ffffff" stroke="#2b2f33" strokeWidth="0.25" />
    </svg>
  );
}
