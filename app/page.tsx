import Link from "next/link";
import { redirect } from "next/navigation";
import { getSessionUser } from "@/db/access";
import { Mark } from "./_ui/mark";

export default async function LandingPage() {
  if (await getSessionUser()) redirect("/home");
  return (
    <div className="mx-auto flex min-h-dvh max-w-5xl flex-col px-6 py-10">
      <header className="flex items-center justify-between">
        <span className="flex items-center gap-2">
          <Mark />
          <span className="text-xl font-semibold tracking-tight">Borewright</span>
        </span>
        <nav className="flex gap-3">
          <Link href="/sign-in" className="btn-quiet no-underline">
            Sign in
          </Link>
          <Link href="/sign-up" className="btn no-underline">
            Create an account
          </Link>
        </nav>
      </header>
      <main className="flex flex-1 flex-col justify-center gap-10 py-16">
        <div className="max-w-2xl">
          <h1 className="text-4xl font-semibold leading-tight md:text-5xl">Know the cut before you make it.</h1>
          <p className="mt-5 text-lg text-ink-2">
            Borewright tells an engine builder whether a big-bore cylinder&apos;s skirt will go into the crankcase mouth, how far the mouth must be
            counterbored, how much sealing land is left at every stud, and exactly how to set the boring rig — before a kit is bought or a cutter
            turns.
          </p>
        </div>
        <dl className="grid gap-4 md:grid-cols-3">
          {[
            ["Fit", "Skirt against mouth, worst reading wins: clearance or interference, in mm or inches."],
            ["Cut", "The least counterbore that clears, the wall it leaves at studs and passages, the largest cut the case can take."],
            ["Rig", "Cutter setting, bit reach, the groove and shims for the depth, holder tilt and spindle speed."],
          ].map(([t, d]) => (
            <div key={t} className="card p-5">
              <dt className="font-semibold text-accent">{t}</dt>
              <dd className="mt-2 text-sm text-ink-2">{d}</dd>
            </div>
          ))}
        </dl>
        <p>
          <Link href="/try" className="btn-quiet no-underline">
            Try it on an example case — no account needed
          </Link>
        </p>
      </main>
      <footer className="text-xs text-ink-3">
        Borewright plans; it does not replace the kit maker&apos;s instructions, local regulations or a qualified machinist.
      </footer>
    </div>
  );
}
