import Link from "next/link";
import type { Caller } from "@/db/access";
import { jobsForStudy } from "@/db/jobs";
import { STATUS_LABEL } from "@/model/job-status";

/** On a study's page: open a job for the study, and reach the jobs already opened from it and their setup cards. */
export async function StudyJobs({ caller, studyId }: { caller: Caller; studyId: string }) {
  const jobs = await jobsForStudy(caller, studyId);
  return (
    <nav aria-label="Jobs from this study" className="flex flex-wrap items-center gap-x-4 gap-y-2 text-sm">
      <Link href={`/jobs/new?studyId=${encodeURIComponent(studyId)}`} className="btn-quiet no-underline">
        Open a job for this study
      </Link>
      {jobs.map((j) => (
        <span key={j.id} className="flex flex-wrap items-center gap-2">
          <Link href={`/jobs/${j.id}`}>
            <span className="num">{j.reference}</span> {j.title}
          </Link>
          <span className="text-ink-3">({STATUS_LABEL[j.status].toLowerCase()})</span>
          {j.hasPlan ? <Link href={`/setup-card/${j.id}`}>Setup card</Link> : null}
        </span>
      ))}
    </nav>
  );
}
