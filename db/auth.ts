import "server-only";
import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { organization } from "better-auth/plugins";
import { and, asc, eq, isNull } from "drizzle-orm";
import { dbSync } from "./client";
import { actionMail, sendMail } from "./mail";
import { accessControl, roles } from "./roles";
import * as schema from "./schema";
import { createShopFor } from "./shops";

/** The public address of the app, used in mailed links. */
export function appUrl(): string {
  return (process.env.BETTER_AUTH_URL || "http://localhost:3000").replace(/\/$/, "");
}

function trustedOrigins(): string[] {
  const base = new URL(appUrl());
  const origins = new Set([base.origin]);
  // localhost and 127.0.0.1 are the same machine; a browser may use either.
  if (base.hostname === "localhost") origins.add(`${base.protocol}//127.0.0.1${base.port ? `:${base.port}` : ""}`);
  if (base.hostname === "127.0.0.1") origins.add(`${base.protocol}//localhost${base.port ? `:${base.port}` : ""}`);
  for (const extra of (process.env.TRUSTED_ORIGINS ?? "").split(",").map((s) => s.trim()).filter(Boolean)) origins.add(extra);
  return [...origins];
}

export const MIN_PASSWORD_LENGTH = 10;

export const auth = betterAuth({
  appName: "Borewright",
  baseURL: appUrl(),
  secret: process.env.BETTER_AUTH_SECRET,
  trustedOrigins: trustedOrigins(),
  database: drizzleAdapter(dbSync(), { provider: "sqlite", schema }),
  user: {
    additionalFields: {
      units: { type: "string", required: false, defaultValue: "mm", input: false },
    },
  },
  emailAndPassword: {
    enabled: true,
    minPasswordLength: MIN_PASSWORD_LENGTH,
    maxPasswordLength: 128,
    autoSignIn: true,
    requireEmailVerification: false,
    resetPasswordTokenExpiresIn: 60 * 60,
    sendResetPassword: async ({ user, url }) => {
      await sendMail(
        actionMail(user.email, "Reset your Borewright password", [
          `Hello ${user.name},`,
          "Someone asked to reset the password of this Borewright account. If it was not you, ignore this message.",
          "The link works for one hour.",
        ], { label: "Choose a new password", url }),
      );
    },
  },
  emailVerification: {
    sendOnSignUp: true,
    autoSignInAfterVerification: true,
    sendVerificationEmail: async ({ user, url }) => {
      await sendMail(
        actionMail(user.email, "Confirm your e-mail for Borewright", [
          `Hello ${user.name},`,
          "Confirm this address so your shop can reach you with invitations, shared plans and password resets.",
        ], { label: "Confirm my e-mail", url }),
      );
    },
  },
  rateLimit: {
    enabled: process.env.AUTH_RATE_LIMIT !== "off",
    window: 60,
    max: 200,
    customRules: {
      "/sign-in/email": { window: 10, max: 5 },
      "/sign-up/email": { window: 60, max: 10 },
      "/request-password-reset": { window: 60, max: 5 },
    },
  },
  advanced: {
    cookiePrefix: "borewright",
    defaultCookieAttributes: { httpOnly: true, sameSite: "lax" },
  },
  databaseHooks: {
    user: {
      create: {
        // A person who signs up without an invitation waiting gets a shop of their own, as its owner.
        after: async (created) => {
          const db = dbSync();
          const pending = await db.query.invitation.findFirst({
            where: and(eq(schema.invitation.email, created.email.toLowerCase()), eq(schema.invitation.status, "pending")),
          });
          if (!pending) {
            const shopId = await createShopFor(db, { id: created.id, name: created.name });
            // The first session may already exist by the time this runs: point it at the new shop.
            await db
              .update(schema.session)
              .set({ activeOrganizationId: shopId })
              .where(and(eq(schema.session.userId, created.id), isNull(schema.session.activeOrganizationId)));
          }
        },
      },
    },
    session: {
      create: {
        // Land in the person's first shop.
        before: async (session) => {
          const first = await dbSync().query.member.findFirst({
            where: eq(schema.member.userId, session.userId),
            orderBy: asc(schema.member.createdAt),
          });
          return { data: { ...session, activeOrganizationId: first?.organizationId ?? null } };
        },
      },
    },
  },
  plugins: [
    organization({
      ac: accessControl,
      roles,
      creatorRole: "owner",
      allowUserToCreateOrganization: true,
      invitationExpiresIn: 7 * 24 * 60 * 60,
      cancelPendingInvitationsOnReInvite: true,
      sendInvitationEmail: async ({ email, role, organization: shop, inviter, id }) => {
        await sendMail(
          actionMail(email, `${shop.name} invites you to Borewright`, [
            `${inviter.user.name} invites you to join ${shop.name} on Borewright as ${role === "customer" ? "a customer" : `its ${role}`}.`,
            "Open the link to accept. If you have no account yet, you can create one on the way.",
          ], { label: "Accept the invitation", url: `${appUrl()}/invite/${id}` }),
        );
      },
    }),
    nextCookies(),
  ],
});

export type Session = typeof auth.$Infer.Session;
