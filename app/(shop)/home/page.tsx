import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { requirePage } from "../../_ui/guard";

export const metadata: Metadata = { title: "Workbench" };

export default async function HomePage({ searchParams }: { searchParams: Promise<{ verified?: string }> }) {
  const caller = await requirePage("/home");
  if (caller.role === "customer") redirect("/consult");
  const { verified } = await searchParams;
  // In the order a first study needs them; each card opens the form that makes the thing.
  const steps = [
    { href: "/library/cases/new", title: "1 · Describe the crankcase", text: "Add a case profile: the mouth read with calipers (the smallest reading counts), the studs, the deck outline, the transfer passages." },
    { href: "/library/kits/new", title: "2 · Add the candidate kits", text: "Bore, skirt diameter readings (the largest counts), skirt length, studs, gaskets, price." },
    { href: "/library/rigs/new", title: "3 · Add your boring rig", text: "Head diameter, the bit's reach, the stop grooves and the shims at hand: every study then gives the cutter setting, the depth stop and the speed." },
    { href: "/studies", title: "4 · Open a study", text: "See whether each skirt clears, the cut it needs, the sealing land left at every stud, and how to set the boring rig." },
  ];
  return (
    <div className="flex flex-col gap-8">
      {verified ? <p className="rounded-md border-l-4 border-success bg-paper-2 px-4 py-3 text-sm">Your e-mail address is confirmed.</p> : null}
      <div>
        <h1 className="text-3xl font-semibold">Workbench</h1>
        <p className="mt-2 max-w-prose text-ink-2">
          {caller.shopName}: will the skirt go into the case, how much must be cut, will the case survive it, and how to set the rig — answered before
          anything is bought or cut.
        </p>
      </div>
      <ol className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
        {steps.map((s) => (
          <li key={s.title} className="card p-5">
            <Link href={s.href} className="font-semibold text-accent">
              {s.title}
            </Link>
            <p className="mt-2 text-sm text-ink-2">{s.text}</p>
          </li>
        ))}
      </ol>
      <p className="caution max-w-prose">
        Cutting a crankcase can ruin it and can hurt you. Wear eye protection, secure the case without crushing it, and follow the kit maker&apos;s
        instructions and local rules; a change of displacement may change the vehicle&apos;s legal class.
      </p>
    </div>
  );
}
