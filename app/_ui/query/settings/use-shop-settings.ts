"use client";

import { useQuery } from "@tanstack/react-query";
import { getJson } from "../fetch";
import type { ShopSettings } from "../types";
import { settingsKeys } from "./keys";

export const fetchShopSettings = () => getJson<ShopSettings>("/api/v1/settings");

/** The shop's units and default limits. */
export function useShopSettings() {
  return useQuery({ queryKey: settingsKeys.shop(), queryFn: fetchShopSettings, staleTime: 5 * 60_000 });
}

/** The zone the shop's dates and times are shown in; UTC (named as such) until the settings have loaded. */
export function useShopTimeZone(): string {
  return useShopSettings().data?.settings.timeZone ?? "UTC";
}
