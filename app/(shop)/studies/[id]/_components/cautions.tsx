/** The cautions that belong beside the cut and the rig set-up. */
export function Cautions({ compact = false }: { compact?: boolean }) {
  return (
    <aside className="caution" aria-label="Safety cautions" data-testid="cautions">
      <p className="font-semibold">Before and during the cut</p>
      <ul className={`mt-1 list-disc pl-5 ${compact ? "text-xs" : ""}`}>
        <li>Wear eye protection; chips leave the cutter fast.</li>
        <li>Secure the case so it cannot move, without clamping so hard that it cracks.</li>
        <li>Check the bit and every fastener of the head before starting and during the cut.</li>
        <li>Remove every chip from the crankcase before assembly.</li>
        <li>A change of displacement may change the vehicle&apos;s legal class; local rules decide.</li>
      </ul>
      <p className={`mt-1 ${compact ? "text-xs" : "text-xs"} text-ink-2`}>
        These figures plan the work; the kit maker&apos;s instructions, local regulations and a qualified machinist come first.
      </p>
    </aside>
  );
}
