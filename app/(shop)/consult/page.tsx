import type { Metadata } from "next";
import Link from "next/link";
import { listJobs } from "@/db/jobs";
import { SHOP_STAFF } from "@/db/roles";
import { EmptyState } from "../../_ui/empty-state";
import { requirePage } from "../../_ui/guard";
import { StatusBadge } from "../jobs/_components/status-badge";

export const metadata: Metadata = { title: "Consult" };

/** The customer's shared plans at this shop. */
export default async function ConsultPage() {
  const caller = await requirePage("/consult");
  if (SHOP_STAFF.includes(caller.role)) {
    return (
      <div className="mx-auto flex max-w-lg flex-col gap-3 py-12">
        <h1 className="text-2xl font-semibold">Customers&apos; plans</h1>
        <p className="text-ink-2">Here a customer finds the plans the shop shared with them. The shop&apos;s side of each job — the plan, the quote, sharing — is on the Jobs page.</p>
        <p><Link className="btn no-underline" href="/jobs">Open the jobs</Link></p>
      </div>
    );
  }
  const page = await listJobs(caller, { page: 1, pageSize: 100 });
  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-3xl font-semibold">Your plans at {caller.shopName}</h1>
      {page.items.length === 0 ? (
        <EmptyState title="Nothing shared with you yet">
          When the shop shares the plan for your engine, it appears here and you receive an e-mail with a link.
        </EmptyState>
      ) : (
        <ul className="flex flex-col gap-3">
          {page.items.map((j) => (
            <li key={j.id} className="card flex flex-wrap items-center justify-between gap-3 p-4">
              <div>
                <Link href={`/consult/${j.id}`} className="text-lg font-semibold">{j.title}</Link>
                <p className="text-sm text-ink-2">{j.plan ? `Planned with ${j.plan.kitName}` : "Plan in preparation"} · <span className="num">{j.reference}</span></p>
              </div>
              <StatusBadge status={j.status} />
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
