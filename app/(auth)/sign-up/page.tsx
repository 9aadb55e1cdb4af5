import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getSessionUser } from "@/db/access";
import { SignUpForm } from "../_components/sign-up-form";
import { safeNext } from "../_components/schemas";

export const metadata: Metadata = { title: "Create an account" };

export default async function SignUpPage({ searchParams }: { searchParams: Promise<{ next?: string; email?: string }> }) {
  const { next, email } = await searchParams;
  if (await getSessionUser()) redirect(safeNext(next));
  return <SignUpForm next={next} email={email} />;
}
