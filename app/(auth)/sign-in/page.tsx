import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getSessionUser } from "@/db/access";
import { SignInForm } from "../_components/sign-in-form";
import { safeNext } from "../_components/schemas";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string; email?: string; reset?: string }> }) {
  const { next, email, reset } = await searchParams;
  if (await getSessionUser()) redirect(safeNext(next));
  return <SignInForm next={next} email={email} notice={reset ? "Your password was changed. Sign in with the new one." : undefined} />;
}
