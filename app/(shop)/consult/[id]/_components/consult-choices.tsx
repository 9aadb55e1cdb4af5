import type { KitResult, LengthUnits } from "@/geometry";
import { VERDICT_TEXT } from "@/model/verdict";
import { lengthLabel } from "@/model/units";
import { VerdictMark } from "@/app/_ui/studio/verdict-mark";

/** The product's one set of verdict words (model/verdict.ts), each with what it means for the customer. */
const VERDICT_WORDS: Record<KitResult["verdict"], string> = {
  "fits-as-is": `${VERDICT_TEXT["fits-as-is"].words} — no cutting needed.`,
  "fits-after-cut": `${VERDICT_TEXT["fits-after-cut"].words} — once the case mouth is cut to size.`,
  "cannot-fit": `${VERDICT_TEXT["cannot-fit"].words} — not on this case.`,
};

/** Every kit the shop compared, in plain words: displacement, the cut it needs and its risk; the shop's choice marked. */
export function ConsultChoices({ kits, chosenKitId, units }: { kits: readonly KitResult[]; chosenKitId: string; units: LengthUnits }) {
  const L = (mm: number) => lengthLabel(mm, units);
  return (
    <section aria-label="The choices" className="flex flex-col gap-3">
      <h2 className="text-2xl font-semibold">The kits we compared, in plain words</h2>
      <ul className="grid gap-3 md:grid-cols-2">
        {kits.map((k) => (
          <li key={k.kitId} className={`card p-4 text-lg ${k.kitId === chosenKitId ? "border-2 border-accent" : ""}`}>
            <p className="font-semibold">{k.name}{k.kitId === chosenKitId ? " — the shop's choice" : ""}</p>
            <p>Displacement <span className="num">{k.displacementCc.stockRounded} cc → {k.displacementCc.kitRounded} cc</span>.</p>
            <p>{k.cut ? <>The case mouth must be cut to <span className="num">{L(k.cut.diameterMm)}</span> across, <span className="num">{L(k.cut.depthMm)}</span> deep.</> : "No cutting needed."}</p>
            <p>
              Risk: <VerdictMark verdict={k.verdict} words={VERDICT_WORDS[k.verdict]} />
              {k.thinnestWall && k.verdict !== "cannot-fit" ? <> The thinnest wall left is <span className="num">{L(k.thinnestWall.minWallMm)}</span>.</> : null}
            </p>
          </li>
        ))}
      </ul>
    </section>
  );
}
