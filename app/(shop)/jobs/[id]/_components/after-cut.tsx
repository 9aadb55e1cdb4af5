import type { Caller } from "@/db/access";
import type { JobDetail } from "@/db/jobs";
import { dateText } from "@/model/dates";
import { PlanVsActual } from "./plan-vs-actual";
import { ReadingsForm } from "./readings-form";
import { VerifyDecision } from "./verify-decision";

/** The plan against what was cut: the readings' verdict, an override if one was given, and the readings form once machined. */
export function AfterCut({ detail, role, zone }: { detail: JobDetail; role: Caller["role"]; zone: string }) {
  const { job, plan, readings } = detail;
  return (
    <section className="flex flex-col gap-3">
      <h2 className="text-xl font-semibold">Plan against actual</h2>
      {readings ? <PlanVsActual verification={readings.verification} at={readings.at} /> : <p className="text-ink-2">No after-cut readings yet.</p>}
      {job.verification?.override ? (
        <p className="rounded-md border-l-4 border-error bg-paper-2 px-4 py-2 text-sm" data-testid="verify-override">
          Verified although the readings are outside the plan, on {job.verification.override.by.name}&apos;s override ({dateText(job.verification.override.at, zone)}): {job.verification.override.reason}
        </p>
      ) : null}
      {job.status === "machined" && job.verification?.verdict === "fail" ? <VerifyDecision jobId={job.id} role={role} /> : null}
      {job.status === "machined" && plan ? (
        <ReadingsForm jobId={job.id} studs={plan.study.case.studs.map((s) => s.label)} previous={readings?.readings ?? null} />
      ) : job.status === "approved" || job.status === "planned" || job.status === "intake" ? (
        <p className="text-sm text-ink-3">The readings form opens once the job is machined.</p>
      ) : null}
    </section>
  );
}
