import type { Metadata } from "next";
import { listMembers, listPendingInvitations } from "@/db/members";
import { getSettings } from "@/db/settings";
import { requirePage } from "../../_ui/guard";
import { LimitsForm } from "./_components/limits-form";
import { PricingForm } from "./_components/pricing-form";
import { InviteForm, InvitationRow, MemberActions } from "./_components/members";

export const metadata: Metadata = { title: "Shop settings" };

const date = (d: Date) => d.toISOString().slice(0, 10);

export default async function SettingsPage() {
  const caller = await requirePage("/settings", ["owner"]);
  const [members, invitations, settings] = await Promise.all([listMembers(caller), listPendingInvitations(caller), getSettings(caller)]);
  return (
    <div className="flex flex-col gap-8">
      <div>
        <h1 className="text-3xl font-semibold">Shop settings</h1>
        <p className="mt-1 text-ink-2">{caller.shopName}: members and their roles, the prices quotes are written with, and the limits every study is checked against.</p>
      </div>
      <section className="card p-6" aria-labelledby="members-h">
        <h2 id="members-h" className="text-lg font-semibold">
          Members
        </h2>
        <p className="mt-1 text-sm text-ink-2">
          Owners manage members, settings and money. Builders work on the library, studies and jobs. Customers see only what the shop shares with
          them.
        </p>
        {/* On a phone the table scrolls inside its own box rather than widening the page. */}
        <div className="mt-4 overflow-x-auto" tabIndex={0} role="region" aria-label="Members of the shop">
        <table className="w-full text-sm">
          <thead className="text-left text-ink-2">
            <tr>
              <th className="py-2">Name</th>
              <th>E-mail</th>
              <th>Role</th>
              <th>Joined</th>
              <th />
            </tr>
          </thead>
          <tbody>
            {members.map((m) => (
              <tr key={m.id} className="border-t border-rule">
                <td className="py-2">{m.name}</td>
                <td className="break-all">{m.email}</td>
                <td>{m.role}</td>
                <td className="num">{date(m.joinedAt)}</td>
                <td className="text-right">{m.userId !== caller.userId ? <MemberActions memberId={m.id} name={m.name} /> : <span className="text-ink-3">you</span>}</td>
              </tr>
            ))}
          </tbody>
        </table>
        </div>
      </section>
      <section className="card p-6" aria-labelledby="invite-h">
        <h2 id="invite-h" className="text-lg font-semibold">
          Invite someone
        </h2>
        <InviteForm shopId={caller.shopId} />
        {invitations.length > 0 ? (
          <div className="mt-6">
            <h3 className="font-medium">Waiting for an answer</h3>
            <ul className="mt-2 divide-y divide-rule text-sm">
              {invitations.map((i) => (
                <InvitationRow key={i.id} id={i.id} email={i.email} role={i.role ?? "builder"} expires={date(i.expiresAt)} />
              ))}
            </ul>
          </div>
        ) : (
          <p className="mt-4 text-sm text-ink-2">No invitation is waiting for an answer.</p>
        )}
      </section>
      <section className="card p-6" aria-labelledby="pricing-h">
        <h2 id="pricing-h" className="text-lg font-semibold">
          Prices
        </h2>
        <PricingForm pricing={settings.settings.pricing} version={settings.version} />
      </section>
      <section className="card p-6" aria-labelledby="limits-h">
        <h2 id="limits-h" className="text-lg font-semibold">
          Default limits
        </h2>
        <LimitsForm limits={settings.settings.limits} defaulted={settings.settings.defaulted} version={settings.version} units={caller.units} />
      </section>
    </div>
  );
}
