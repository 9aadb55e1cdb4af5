import Link from "next/link";
import { listMyShops } from "@/db/access";
import { Mark } from "../_ui/mark";
import { outboxEnabled, requirePage } from "../_ui/guard";
import { HeaderControls } from "./_components/header-controls";
import { navFor } from "./_components/nav";

export default async function ShopLayout({ children }: { children: React.ReactNode }) {
  const caller = await requirePage("/home");
  const shops = await listMyShops(caller.userId);
  const nav = navFor(caller.role, { outbox: outboxEnabled() });
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="border-b border-rule bg-paper-2/60">
        {/* Everything wraps rather than widening the page: on a phone the menu takes two lines, never a sideways scroll. */}
        <div className="mx-auto flex max-w-7xl flex-wrap items-center justify-between gap-x-4 gap-y-2 px-4 py-3 sm:px-6">
          <div className="flex min-w-0 flex-wrap items-center gap-x-6 gap-y-2">
            <Link href="/home" className="flex items-center gap-2 text-ink no-underline">
              <Mark size={24} />
              <span className="font-semibold tracking-tight">Borewright</span>
            </Link>
            <nav aria-label="Main" className="flex flex-wrap gap-1">
              {nav.map((item) => (
                <Link key={item.href} href={item.href} className="rounded-md px-3 py-1.5 text-sm text-ink-2 no-underline hover:bg-card hover:text-ink">
                  {item.label}
                </Link>
              ))}
            </nav>
          </div>
          <div className="flex min-w-0 flex-wrap items-center gap-x-4 gap-y-2">
            <span className="min-w-0 break-words text-sm text-ink-2" data-testid="who">
              {caller.name} · <span className="text-ink">{caller.shopName}</span> · {caller.role}
            </span>
            <HeaderControls shops={shops} activeShopId={caller.shopId} units={caller.units} />
          </div>
        </div>
      </header>
      {!caller.emailVerified ? (
        <div className="border-b border-caution bg-caution-soft px-6 py-2 text-center text-sm">
          Confirm your e-mail address: the link is in your inbox.
        </div>
      ) : null}
      <main className="mx-auto w-full min-w-0 max-w-7xl flex-1 px-6 py-6 sm:py-8">{children}</main>
      <footer className="border-t border-rule px-6 py-4 text-center text-xs text-ink-3">
        Borewright plans cuts; it does not replace the kit maker&apos;s instructions, local regulations or a qualified machinist.
      </footer>
    </div>
  );
}
