import type { Metadata } from "next";
import { notFound } from "next/navigation";

// The framework's own floor for `npm run bench:pages`: a page of this same production server, rendered on the
// server in the root layout (its fonts and styles), with no component of its own in the browser, so the only
// scripts it loads are the framework's root scripts. It exists only when the server was started with
// BOREWRIGHT_BENCH_PAGE_FLOOR set; otherwise it is a 404 like any unknown address.

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Page floor", robots: { index: false } };

export default function PageFloor() {
  if (!process.env.BOREWRIGHT_BENCH_PAGE_FLOOR) notFound();
  return (
    <main className="mx-auto flex max-w-3xl flex-col gap-3 px-4 py-6">
      <h1 className="text-3xl font-semibold">Borewright</h1>
      <p className="text-ink-2">
        Check a cylinder kit&apos;s skirt against a crankcase, plan the counterbore and set the boring rig before anything is cut. This page carries
        nothing but the framework&apos;s own scripts.
      </p>
    </main>
  );
}
