import Link from "next/link";

export default function NotFound() {
  return (
    <div className="mx-auto flex min-h-[60dvh] max-w-lg flex-col justify-center gap-3 px-6">
      <p className="num text-sm text-ink-3">404</p>
      <h1 className="text-2xl font-semibold">Nothing here</h1>
      <p className="text-ink-2">The address is wrong, or what it pointed to is not yours to see.</p>
      <Link href="/home">Back to the workbench</Link>
    </div>
  );
}
