import "server-only";
import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { APIError } from "better-auth/api";
import { organization } from "better-auth/plugins";
import { and, asc, eq, isNull, sql, type Placeholder, type SQL } from "drizzle-orm";
import { alias, type SQLiteColumn } from "drizzle-orm/sqlite-core";
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

/** A person's shop and role in it, as read for a request. */
export type Membership = { role: string; shopId: string; shopName: string };

// The shop a request acts in: the session's active shop while the person still belongs to it, else the
// shop they joined first. Two keyed subqueries (SQLite lets a subquery's WHERE, not its ORDER BY, name the
// outer row), so the same choice is made inside the session's own read.
const chosenMember = alias(schema.member, "chosen_member");
const chosenShop = alias(schema.organization, "chosen_shop");
type Operand = SQL | SQLiteColumn | Placeholder;
function memberIdIn(userId: Operand, shopId: Operand | null) {
  return dbSync()
    .select({ id: chosenMember.id })
    .from(chosenMember)
    .innerJoin(chosenShop, eq(chosenShop.id, chosenMember.organizationId))
    .where(shopId === null ? eq(chosenMember.userId, userId) : and(eq(chosenMember.userId, userId), eq(chosenMember.organizationId, shopId)))
    .orderBy(asc(chosenMember.createdAt), asc(chosenMember.id))
    .limit(1);
}
function chosenMemberId(userId: Operand, activeShopId: Operand) {
  return sql`coalesce((${memberIdIn(userId, activeShopId)}), (${memberIdIn(userId, null)}))`;
}

const membershipColumns = { role: schema.member.role, shopId: schema.organization.id, shopName: schema.organization.name };

/** The session row, its user and the chosen membership in one statement. */
const sessionByToken = dbSync()
  .select({ session: schema.session, user: schema.user, membership: membershipColumns })
  .from(schema.session)
  .innerJoin(schema.user, eq(schema.user.id, schema.session.userId))
  .leftJoin(schema.member, eq(schema.member.id, chosenMemberId(schema.session.userId, schema.session.activeOrganizationId)))
  .leftJoin(schema.organization, eq(schema.organization.id, schema.member.organizationId))
  .where(eq(schema.session.token, sql.placeholder("token")))
  .limit(1)
  .prepare();

/** The chosen membership alone, for a session the library answered. */
const membershipOfUser = dbSync()
  .select(membershipColumns)
  .from(schema.member)
  .innerJoin(schema.organization, eq(schema.organization.id, schema.member.organizationId))
  .where(eq(schema.member.id, chosenMemberId(sql.placeholder("userId"), sql.placeholder("activeShopId"))))
  .limit(1)
  .prepare();

type Found = { session: Session; membership: Membership | null };

/**
 * The session of a request and the shop it acts in, or null: the library's getSession, except that a
 * cookie whose signature the library already accepted in this process is answered by one read of the
 * session row, its user and the membership. A session that is gone, expired or due for the library's
 * refresh goes to the library again (and its membership is read after it).
 */
async function lookUp(headers: Headers): Promise<{ session: Session; membership?: Membership | null } | null> {
  const name = (await auth.$context).authCookies.sessionToken.name;
  const cookie = cookieValue(headers.get("cookie"), name);
  const token = cookie === null ? undefined : verifiedCookies.tokenOf(cookie);
  if (cookie !== null && token !== undefined) {
    const [found] = await sessionByToken.execute({ token });
    if (found && found.session.expiresAt.getTime() > Date.now() && !refreshDue(found.session.expiresAt, SESSION_EXPIRES_IN_S, SESSION_UPDATE_AGE_S)) {
      const { membership, ...session } = found;
      const { role, shopId, shopName } = membership ?? {};
      return { session: session as Session, membership: role && shopId && shopName !== null && shopName !== undefined ? { role, shopId, shopName } : null };
    }
    verifiedCookies.forget(cookie);
  }
  const session = await auth.api.getSession({ headers });
  if (session && cookie !== null) verifiedCookies.remember(cookie, session.session.token);
  return session ? { session } : null;
}

/** The signed-in person of a request, or null. */
export async function sessionOf(headers: Headers): Promise<Session | null> {
  return (await lookUp(headers))?.session ?? null;
}

/** The signed-in person of a request and the membership of the shop the request acts in (null when in none). */
export async function sessionAndShopOf(headers: Headers): Promise<Found | null> {
  const found = await lookUp(headers);
  if (!found) return null;
  if (found.membership !== undefined) return { session: found.session, membership: found.membership };
  const [membership] = await membershipOfUser.execute({ userId: found.session.user.id, activeShopId: found.session.session.activeOrganizationId ?? null });
  return { session: found.session, membership: membership ?? null };
}
