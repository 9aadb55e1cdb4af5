// The shop's settings: units and limits, as sent and as returned. Pure zod: no server-only code.
import { z } from "zod";
import { LimitsSchema, StudyLimitsSchema } from "@/geometry";
import { VersionSchema } from "./common";

export const UnitsSchema = z.enum(["mm", "in"], { error: "units is mm or in." });
export const SettingsPatchSchema = z.strictObject({
  version: VersionSchema,
  units: UnitsSchema.optional(),
  /** The shop's own limits; a limit left out takes its default. Replaces the shop's limits as a whole. */
  limits: StudyLimitsSchema.optional(),
});
export const SettingsSchema = z.object({
  /** timeZone: the zone the shop's dates and times are shown in (an IANA name, e.g. "Europe/Berlin"). */
  settings: z.object({ units: UnitsSchema, limits: LimitsSchema, defaulted: z.array(z.string()), timeZone: z.string() }),
  version: z.number().int(),
});
export type SettingsPatch = z.infer<typeof SettingsPatchSchema>;
export type ShopSettings = z.infer<typeof SettingsSchema>;
