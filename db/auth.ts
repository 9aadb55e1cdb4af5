import "server-only";
import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { APIError } from "better-auth/api";
import { organization } from "better-auth/plugins";
import { and, asc, eq, isNull, sql } from "drizzle-orm";
import { PersonNameSchema } from "@/model/names";
import { CLIENT_ADDRESS_HEADER, VerifiedCookies, cookieValue, refreshDue } from "./auth-guard";
import { dbSync } from "./client";
import { appUrl, trustedOrigins } from "./config";
import { actionMail, sendMail } from "./mail";
import { accessControl, roles } from "./roles";
import * as schema from "./schema";
import { createShopFor } from "./shops";

export { appUrl };

export const MIN_PASSWORD_LENGTH = 10;

/** A session lasts a week, and is extended by the library when it is used after a day. */
const SESSION_EXPIRES_IN_S = 7 * 24 * 60 * 60;
const SESSION_UPDATE_AGE_S = 24 * 60 * 60;

/** A person's name by the product's rules (trimmed), or the library's 400 naming the field. */
function checkedName(name: unknown): string {
  const parsed = PersonNameSchema.safeParse(name);
  if (!parsed.success) throw new APIError("BAD_REQUEST", { message: `[body.name] ${parsed.error.issues[0]?.message ?? "Give your name."}` });
  return parsed.data;
}

export const auth = betterAuth({
  appName: "Borewright",
  baseURL: appUrl(),
  secret: process.env.BETTER_AUTH_SECRET,
  trustedOrigins: trustedOrigins(),
  database: drizzleAdapter(dbSync(), { provider: "sqlite", schema }),
  // No signed cookie cache of the session: a session ended on the server (sign-out, a password reset or
  // change) must end at once, so every request reads the session row (see sessionOf below).
  session: { expiresIn: SESSION_EXPIRES_IN_S, updateAge: SESSION_UPDATE_AGE_S },
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
    // A reset ends every session of the account: whoever held the old password is signed out.
    revokeSessionsOnPasswordReset: true,
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
    // The auth route sets this header from X-Forwarded-For only as far as TRUSTED_PROXY_HOPS allows.
    ipAddress: { ipAddressHeaders: [CLIENT_ADDRESS_HEADER] },
    cookiePrefix: "borewright",
    defaultCookieAttributes: { httpOnly: true, sameSite: "lax" },
  },
  databaseHooks: {
    user: {
      update: {
        before: async (data) => ("name" in data ? { data: { ...data, name: checkedName(data.name) } } : { data }),
      },
      create: {
        before: async (user) => ({ data: { ...user, name: checkedName(user.name) } }),
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
      // Holding an invitation's id is not proof of owning its address: only a confirmed address may accept.
      requireEmailVerificationOnInvitation: true,
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

const verifiedCookies = new VerifiedCookies();
const sessionByToken = dbSync()
  .select({ session: schema.session, user: schema.user })
  .from(schema.session)
  .innerJoin(schema.user, eq(schema.user.id, schema.session.userId))
  .where(eq(schema.session.token, sql.placeholder("token")))
  .limit(1)
  .prepare();

/**
 * The signed-in person of a request, or null: the library's getSession, except that a cookie whose
 * signature the library already accepted in this process is answered by one read of the session row and
 * its user. A session that is gone, expired or due for the library's refresh goes to the library again.
 */
export async function sessionOf(headers: Headers): Promise<Session | null> {
  const name = (await auth.$context).authCookies.sessionToken.name;
  const cookie = cookieValue(headers.get("cookie"), name);
  const token = cookie === null ? undefined : verifiedCookies.tokenOf(cookie);
  if (cookie !== null && token !== undefined) {
    const [found] = await sessionByToken.execute({ token });
    if (found && found.session.expiresAt.getTime() > Date.now() && !refreshDue(found.session.expiresAt, SESSION_EXPIRES_IN_S, SESSION_UPDATE_AGE_S)) {
      return found as Session;
    }
    verifiedCookies.forget(cookie);
  }
  const session = await auth.api.getSession({ headers });
  if (session && cookie !== null) verifiedCookies.remember(cookie, session.session.token);
  return session;
}
