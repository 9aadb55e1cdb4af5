import Link from "next/link";

export default function Forbidden() {
  return (
    <div className="mx-auto flex min-h-[60dvh] max-w-lg flex-col justify-center gap-3 px-6">
      <p className="num text-sm text-ink-3">403</p>
      <h1 className="text-2xl font-semibold">This page is not open to your role</h1>
      <p className="text-ink-2">Ask the shop&apos;s owner if you need it.</p>
      <Link href="/home">Back to the workbench</Link>
    </div>
  );
}
