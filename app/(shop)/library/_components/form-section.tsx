import type { ReactNode } from "react";

/** A titled group of fields, two columns on a laptop, one on a tablet held upright. */
export function FormSection({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="card p-5" aria-label={title}>
      <h2 className="mb-4 text-base font-semibold text-ink">{title}</h2>
      <div className="grid grid-cols-1 gap-4 md:grid-cols-2 [&>*]:min-w-0">{children}</div>
    </section>
  );
}
