import "server-only";
import { forbidden, redirect } from "next/navigation";
import { getCaller, getSessionUser, type Caller } from "@/db/access";
import type { Role } from "@/db/roles";

/** For a page: the caller, or a redirect to sign-in (or to the no-shop page), or 403 for a role not allowed. */
export async function requirePage(path: string, allowed?: readonly Role[]): Promise<Caller> {
  const caller = await getCaller();
  if (!caller) {
    if (await getSessionUser()) redirect("/no-shop");
    redirect(`/sign-in?next=${encodeURIComponent(path)}`);
  }
  if (allowed && !allowed.includes(caller.role)) forbidden();
  return caller;
}

/** Whether the development outbox is on: only where a local mail sink is configured. */
export function outboxEnabled(): boolean {
  return Boolean(process.env.MAIL_SINK_URL);
}
