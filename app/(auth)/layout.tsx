import Link from "next/link";
import { Mark } from "../_ui/mark";

export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return (
    <div className="mx-auto flex min-h-dvh max-w-md flex-col justify-center gap-8 px-6 py-12">
      <Link href="/" className="flex items-center gap-2 self-start text-ink no-underline">
        <Mark />
        <span className="text-xl font-semibold tracking-tight">Borewright</span>
      </Link>
      <main className="card p-6 shadow-sm">{children}</main>
    </div>
  );
}
