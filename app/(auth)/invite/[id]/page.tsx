import type { Metadata } from "next";
import Link from "next/link";
import { getSessionUser } from "@/db/access";
import { findInvitation } from "@/db/invitations";
import { AcceptInvitation, ConfirmFirst } from "./accept";

export const metadata: Metadata = { title: "Invitation" };

export default async function InvitePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const invitation = await findInvitation(id);
  if (!invitation || invitation.status !== "pending" || invitation.expiresAt < new Date()) {
    return (
      <div className="flex flex-col gap-3">
        <h1 className="text-2xl font-semibold">This invitation is no longer open</h1>
        <p className="text-ink-2">It was accepted, withdrawn or has expired. Ask the shop to send a new one.</p>
      </div>
    );
  }
  const session = await getSessionUser();
  const here = `/invite/${id}`;
  const role = invitation.role === "customer" ? "a customer" : `a ${invitation.role ?? "builder"}`;
  if (!session) {
    return (
      <div className="flex flex-col gap-4">
        <h1 className="text-2xl font-semibold">Join {invitation.shopName}</h1>
        <p className="text-ink-2">
          You are invited as {role}. Sign in with <strong>{invitation.email}</strong>, or create an account with it.
        </p>
        <div className="flex gap-3">
          <Link className="btn no-underline" href={`/sign-up?next=${encodeURIComponent(here)}&email=${encodeURIComponent(invitation.email)}`}>
            Create an account
          </Link>
          <Link className="btn-quiet no-underline" href={`/sign-in?next=${encodeURIComponent(here)}&email=${encodeURIComponent(invitation.email)}`}>
            Sign in
          </Link>
        </div>
      </div>
    );
  }
  if (session.user.email.toLowerCase() !== invitation.email.toLowerCase()) {
    return (
      <div className="flex flex-col gap-3">
        <h1 className="text-2xl font-semibold">This invitation is for someone else</h1>
        <p className="text-ink-2">
          It was sent to {invitation.email}; you are signed in as {session.user.email}. Sign out and sign in with the invited address.
        </p>
      </div>
    );
  }
  if (!session.user.emailVerified) return <ConfirmFirst id={id} email={session.user.email} shopName={invitation.shopName} />;
  return <AcceptInvitation id={id} shopName={invitation.shopName} role={role} />;
}
