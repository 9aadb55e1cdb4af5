// The shop's settings: units and limits, as sent and as returned. Pure zod: no server-only code.
import { z } from "zod";
import { LimitsSchema, StudyLimitsSchema } from "@/geometry";
import { AmountMinorSchema, CurrencySchema } from "@/model/money";
import { PercentSchema } from "@/model/quote";
import { VersionSchema } from "./common";

export const UnitsSchema = z.enum(["mm", "in"], { error: "units is mm or in." });
/** The shop's prices: the currency it quotes in, its labour rate per hour (minor units; null when not set), tax and deposit shares. */
export const PricingSchema = z.strictObject({
  currency: CurrencySchema,
  labourRateMinor: AmountMinorSchema.nullable(),
  taxPercent: PercentSchema("The tax rate"),
  depositPercent: PercentSchema("The deposit share"),
});
export type Pricing = z.infer<typeof PricingSchema>;
export const SettingsPatchSchema = z.strictObject({
  version: VersionSchema,
  units: UnitsSchema.optional(),
  /** The shop's own limits; a limit left out takes its default. Replaces the shop's limits as a whole. */
  limits: StudyLimitsSchema.optional(),
  /** The shop's prices, as a whole. */
  pricing: PricingSchema.optional(),
});
export const SettingsSchema = z.object({
  /** timeZone: the zone the shop's dates and times are shown in (an IANA name, e.g. "Europe/Berlin"). */
  settings: z.object({ units: UnitsSchema, limits: LimitsSchema, defaulted: z.array(z.string()), timeZone: z.string(), pricing: PricingSchema }),
  version: z.number().int(),
});
export type SettingsPatch = z.infer<typeof SettingsPatchSchema>;
export type ShopSettings = z.infer<typeof SettingsSchema>;
