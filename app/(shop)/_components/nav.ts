import type { Role } from "@/db/roles";

export type NavItem = { href: string; label: string };

/** What each role sees in the navigation; the pages check the role again on the server. */
export function navFor(role: Role, opts: { outbox: boolean }): NavItem[] {
  if (role === "customer") return [{ href: "/consult", label: "Consult" }];
  const staff: NavItem[] = [
    { href: "/studies", label: "Studies" },
    { href: "/library", label: "Library" },
    { href: "/jobs", label: "Jobs" },
  ];
  if (role === "builder") return staff;
  return [...staff, { href: "/settings", label: "Shop settings" }, ...(opts.outbox ? [{ href: "/outbox", label: "Outbox" }] : [])];
}
