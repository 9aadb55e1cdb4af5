import { DEFER, STUDY_CAUTIONS } from "@/model/cautions";

/** The cautions that belong beside any cut plan, shown once on the page. */
export function Cautions() {
  return (
    <aside className="caution" aria-label="Safety cautions" data-testid="cautions">
      <p className="font-semibold">Before and during the cut</p>
      <ul className="mt-1 list-disc pl-5">
        {STUDY_CAUTIONS.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
      <p className="mt-1 text-xs">{DEFER}</p>
    </aside>
  );
}
