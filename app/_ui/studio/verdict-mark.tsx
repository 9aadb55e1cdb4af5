import type { Verdict } from "@/geometry";
import { VERDICT_COLOURS } from "@/model/palette";
import { VERDICT_TEXT } from "@/model/verdict";

// A verdict as every page writes it: its glyph and its words in its own colour (model/palette.ts), apart from
// the clearance bands' colours, so it reads the same without colour and in black-and-white print.

/** The verdicts' text colours. */
export const VERDICT_CLASS: Readonly<Record<Verdict, string>> = {
  "fits-as-is": "text-verdict-fits",
  "fits-after-cut": "text-verdict-after-cut",
  "cannot-fit": "text-verdict-cannot",
};

/** The verdict's glyph, hidden from screen readers (the words say it), with the space after it. */
export function VerdictGlyph({ verdict }: { verdict: Verdict }) {
  return <span aria-hidden="true">{VERDICT_COLOURS[verdict].icon} </span>;
}

/** The verdict's glyph and words in its colour; `words` stands for the product's words (a customer's sentence). */
export function VerdictMark({ verdict, words, className = "" }: { verdict: Verdict; words?: string; className?: string }) {
  return (
    <span className={`${VERDICT_CLASS[verdict]} ${className}`.trim()}>
      <VerdictGlyph verdict={verdict} />
      {words ?? VERDICT_TEXT[verdict].words}
    </span>
  );
}
