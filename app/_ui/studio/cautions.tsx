/** The cautions that belong beside any cut plan. */
export function Cautions() {
  return (
    <div className="caution" role="note" aria-label="Before you cut">
      <p className="font-medium">Before and during the cut</p>
      <ul className="mt-1 list-disc pl-5">
        <li>Wear eye protection; secure the case firmly without clamping it so hard that it cracks.</li>
        <li>Check the bit and every fastener on the cutter head during the cut.</li>
        <li>Remove every chip from the crankcase before assembly.</li>
        <li>A change of displacement may change the vehicle&apos;s legal class.</li>
      </ul>
      <p className="mt-1 text-xs">Local regulations, the kit maker&apos;s instructions and a qualified machinist come first.</p>
    </div>
  );
}
