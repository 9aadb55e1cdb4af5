import type { Metadata } from "next";
import Link from "next/link";
import { ResetForm } from "../_components/reset-form";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string; error?: string }> }) {
  const { token, error } = await searchParams;
  if (!token || error) {
    return (
      <div className="flex flex-col gap-3">
        <h1 className="text-2xl font-semibold">This link does not work</h1>
        <p className="text-ink-2">It has expired or was already used.</p>
        <Link href="/forgot-password">Send a new link</Link>
      </div>
    );
  }
  return <ResetForm token={token} />;
}
