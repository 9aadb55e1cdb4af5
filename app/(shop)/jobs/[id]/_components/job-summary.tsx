import Link from "next/link";
import type { JobView, PlanSnapshot } from "@/db/jobs";
import type { KitResult, LengthUnits } from "@/geometry";
import { depthStopSentence } from "@/model/depth-stop-words";
import { TERM } from "@/model/glossary";
import { lengthLabel } from "@/model/units";

/** The engine the job is for and the plan it was given: the kit, the cut, the rig's settings, the displacement. */
export function JobSummary({ job, plan, kit, units, when }: { job: JobView; plan: PlanSnapshot | null; kit: KitResult | undefined; units: LengthUnits; when: (at: string) => string }) {
  return (
    <section className="grid gap-4 md:grid-cols-3">
      <div className="card p-4">
        <h2 className="mb-2 font-semibold">The engine</h2>
        <dl className="grid grid-cols-2 gap-y-1 text-sm">
          <dt className="text-ink-2">Engine no.</dt><dd className="num">{job.engineNumber || "—"}</dd>
          <dt className="text-ink-2">Case no.</dt><dd className="num">{job.caseNumber || "—"}</dd>
          <dt className="text-ink-2">Case variant</dt><dd>{job.caseVariant || (plan?.study.case.name ?? "—")}</dd>
        </dl>
      </div>
      <div className="card p-4 md:col-span-2">
        <h2 className="mb-2 font-semibold">The plan</h2>
        {plan && kit ? (
          <PlanFigures job={job} plan={plan} kit={kit} units={units} when={when} />
        ) : (
          <p className="text-ink-2">No plan yet. Attach a study from the <Link href="/studies">studies</Link>; the job is then planned with its chosen kit.</p>
        )}
      </div>
    </section>
  );
}

function PlanFigures({ job, plan, kit, units, when }: { job: JobView; plan: PlanSnapshot; kit: KitResult; units: LengthUnits; when: (at: string) => string }) {
  const L = (mm: number) => lengthLabel(mm, units);
  return (
    <dl className="grid grid-cols-2 gap-y-1 text-sm sm:grid-cols-4">
      <dt className="text-ink-2">Kit</dt><dd className="sm:col-span-3">{kit.name} <span className="text-ink-3">(study “{plan.studyName}”{job.studyId ? <> · <Link href={`/studies/${job.studyId}`}>open</Link></> : null})</span></dd>
      <dt className="text-ink-2">Cut</dt><dd className="num sm:col-span-3">{kit.cut ? `⌀ ${L(kit.cut.diameterMm)} × ${L(kit.cut.depthMm)} deep` : "no cut needed"}</dd>
      <dt className="text-ink-2">{TERM.cutterSetting.short}</dt><dd className="num">{kit.rig ? L(kit.rig.cutterSettingToSetMm ?? kit.rig.cutterSettingMm) : "—"}</dd>
      <dt className="text-ink-2">{TERM.depthStop.label}</dt><dd>{kit.rig ? depthStopSentence(kit.rig.depthStop, units) : "—"}</dd>
      <dt className="text-ink-2">Displacement</dt><dd className="num">{kit.displacementCc.stockRounded} → {kit.displacementCc.kitRounded} cc</dd>
      <dt className="text-ink-2">Taken</dt><dd className="num">{when(plan.takenAt)}</dd>
    </dl>
  );
}
