import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { readOutbox } from "@/db/mail";
import { shopTimeZone } from "@/db/settings";
import { dateTimeText } from "@/model/dates";
import { EmptyState } from "../../_ui/empty-state";
import { outboxEnabled, requirePage } from "../../_ui/guard";

export const metadata: Metadata = { title: "Outbox" };
export const dynamic = "force-dynamic";

export default async function OutboxPage() {
  const caller = await requirePage("/outbox", ["owner"]);
  if (!outboxEnabled()) notFound();
  const messages = await readOutbox(caller);
  const zone = shopTimeZone();
  return (
    <div className="flex flex-col gap-6">
      <div>
        <h1 className="text-3xl font-semibold">Outbox</h1>
        <p className="mt-1 max-w-prose text-ink-2">
          Mail caught by the local mail sink, newest first: mail to you, the invitations of your shop, and other mail to the members of
          your shop. Password resets and address confirmations are shown only to the person they were sent to. This page exists only where
          the product runs with the local sink; a real deployment sends through its mail service.
        </p>
      </div>
      {messages === null ? (
        <p className="caution">The mail sink does not answer at {process.env.MAIL_SINK_URL}. Start the product with its demo or dev script.</p>
      ) : messages.length === 0 ? (
        <EmptyState title="No mail yet">Invitations, password resets and confirmations appear here as soon as they are sent.</EmptyState>
      ) : (
        <ul className="flex flex-col gap-3">
          {messages.map((m) => (
            <li key={m.id} className="card p-4" data-testid="outbox-message">
              <div className="flex flex-wrap justify-between gap-2 text-sm">
                <span className="font-semibold">{m.subject}</span>
                <span className="break-all text-ink-2">
                  to {m.to.join(", ")} · <span className="num">{dateTimeText(m.receivedAt, zone)}</span>
                </span>
              </div>
              <pre className="mt-2 whitespace-pre-wrap break-all font-sans text-sm text-ink-2">{m.text}</pre>
              {m.links.length ? (
                <div className="mt-2 flex flex-wrap gap-2">
                  {m.links.map((l) => (
                    <a key={l} href={l} className="btn-quiet no-underline">
                      Open link
                    </a>
                  ))}
                </div>
              ) : null}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
