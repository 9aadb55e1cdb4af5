import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { LimitsSchema, StudyLimitsSchema, resolveLimits, type StudyLimits } from "@/geometry";
import { CURRENCY_CODES, type CurrencyCode } from "@/model/money";
import type { Pricing, SettingsPatch, ShopSettings } from "@/model/schemas";
import { AccessError, type Caller } from "./access";
import { getDb } from "./client";
import { DataError, conflict } from "./errors";
import { assertStaff, fieldsOf, readColumn } from "./rows";
import * as schema from "./schema";

const prefixed = (prefix: string, fields: Record<string, string>) =>
  Object.fromEntries(Object.entries(fields).map(([k, v]) => [`${prefix}.${k}`, v]));

// A shop's settings: the units it reads by default, its own limits (a subset; the rest are the core's
// defaults, shown as such) and its prices (currency, labour rate, tax and deposit shares).

/** The limits the shop set itself, as stored (a damaged or outdated column counts as none set). */
export function parseShopLimits(json: string | null | undefined): StudyLimits {
  return readColumn(StudyLimitsSchema, json, {}, "the shop's limits");
}

/**
 * The time zone every date and time of the shop is shown in: the server's (set with the standard TZ
 * variable, e.g. TZ=Europe/Berlin), named beside each time so nobody reads it as their own.
 */
export function shopTimeZone(): string {
  return Intl.DateTimeFormat().resolvedOptions().timeZone || "UTC";
}

async function readRow(shopId: string) {
  const db = await getDb();
  const [row] = await db.select().from(schema.shopSettings).where(eq(schema.shopSettings.organizationId, shopId)).limit(1);
  return row ?? null;
}

/** The shop's own limits, for assembling its studies. */
export async function shopLimits(shopId: string): Promise<StudyLimits> {
  return parseShopLimits((await readRow(shopId))?.limitsJson);
}

type Row = typeof schema.shopSettings.$inferSelect;

const DEFAULT_PRICING: Pricing = { currency: "EUR", labourRateMinor: null, taxPercent: 0, depositPercent: 30 };

function pricingOf(row: Row | null): Pricing {
  if (!row) return DEFAULT_PRICING;
  const currency = (CURRENCY_CODES as readonly string[]).includes(row.currency) ? (row.currency as CurrencyCode) : DEFAULT_PRICING.currency;
  return { currency, labourRateMinor: row.labourRateMinor, taxPercent: row.taxPercent, depositPercent: row.depositPercent };
}

/** The shop's currency, labour rate, tax and deposit shares, for pricing a quote. */
export async function shopPricing(shopId: string): Promise<Pricing> {
  return pricingOf(await readRow(shopId));
}

function present(row: Row | null): ShopSettings {
  const own = parseShopLimits(row?.limitsJson);
  const resolved = resolveLimits(own);
  return {
    settings: { units: row?.units === "in" ? "in" : "mm", limits: resolved.values, defaulted: resolved.defaulted, timeZone: shopTimeZone(), pricing: pricingOf(row) },
    version: row?.version ?? 1,
  };
}

/** The shop's settings with every limit filled and the defaulted ones named (owner and builder). */
export async function getSettings(caller: Caller): Promise<ShopSettings> {
  assertStaff(caller);
  return present(await readRow(caller.shopId));
}

/** Changes the shop's units, limits or prices (owner only); a stale version is refused with 409. */
export async function updateSettings(caller: Caller, patch: SettingsPatch): Promise<ShopSettings> {
  if (caller.role !== "owner") throw new AccessError("forbidden", "Only the shop's owner changes its settings.");
  const db = await getDb();
  const current = await readRow(caller.shopId);
  const currentVersion = current?.version ?? 1;
  if (patch.version !== currentVersion) throw conflict();
  if (patch.limits !== undefined) {
    // The shop's limits with the defaults filled must hold together too (the lowest cutting speed under the highest).
    const full = LimitsSchema.safeParse(resolveLimits(patch.limits).values);
    if (!full.success) throw new DataError("invalid_input", "Some fields are not valid.", prefixed("limits", fieldsOf(full.error)));
  }
  const set = {
    ...(patch.units !== undefined ? { units: patch.units } : {}),
    ...(patch.limits !== undefined ? { limitsJson: JSON.stringify(patch.limits) } : {}),
    ...(patch.pricing !== undefined ? patch.pricing : {}),
  };
  if (Object.keys(set).length === 0) return present(current);
  const s = schema.shopSettings;
  if (!current) {
    // A shop made before settings existed: its first change creates the row, unless another did first.
    const inserted = await db
      .insert(s)
      .values({ organizationId: caller.shopId, ...DEFAULT_PRICING, ...set, units: set.units ?? "mm", limitsJson: set.limitsJson ?? "{}", version: 2, updatedAt: new Date() })
      .onConflictDoNothing();
    if (inserted.rowsAffected === 0) throw conflict();
  } else {
    const updated = await db
      .update(s)
      .set({ ...set, version: sql`${s.version} + 1`, updatedAt: new Date() })
      .where(and(eq(s.organizationId, caller.shopId), eq(s.version, patch.version)));
    if (updated.rowsAffected === 0) throw conflict();
  }
  return present(await readRow(caller.shopId));
}
