import type { JobDetail } from "@/db/jobs";

/** What happened to the job, newest first, beside the customer's questions. */
export function JobHistory({ detail, when }: { detail: JobDetail; when: (at: string) => string }) {
  return (
    <section className="grid gap-6 md:grid-cols-2">
      <div>
        <h2 className="mb-2 text-xl font-semibold">History</h2>
        <ol className="flex flex-col gap-1 text-sm" data-testid="history">
          {detail.history.map((h, i) => (
            <li key={i} className="border-b border-rule py-1">
              <span className="num text-ink-3">{when(h.at)}</span> · <strong>{h.by.name}</strong> {h.summary}
            </li>
          ))}
        </ol>
      </div>
      <div>
        <h2 className="mb-2 text-xl font-semibold">Questions from the customer</h2>
        {detail.questions.length === 0 ? (
          <p className="text-sm text-ink-2">None yet. The customer can ask from the consult page; questions arrive here and by e-mail.</p>
        ) : (
          <ul className="flex flex-col gap-2 text-sm">
            {detail.questions.map((q) => (
              <li key={q.id} className="card p-3"><span className="text-ink-3 num">{when(q.at)}</span> · <strong>{q.by.name}</strong>: {q.text}</li>
            ))}
          </ul>
        )}
      </div>
    </section>
  );
}
