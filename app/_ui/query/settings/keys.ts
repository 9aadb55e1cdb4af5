/** Query keys of the shop settings (the default limits shown in every study). */
export const settingsKeys = {
  all: ["settings"] as const,
  shop: () => [...settingsKeys.all, "shop"] as const,
};
