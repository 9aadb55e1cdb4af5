import { describe, expect, it } from "vitest";

// The browser's first script sets zod's settings without importing zod; zod, loaded after it, must read them.
describe("the browser's first script", () => {
  it("turns zod's compiled validators off before zod loads, and zod then reads the setting", async () => {
    const holder = globalThis as { __zod_globalConfig?: { jitless?: boolean } };
    delete holder.__zod_globalConfig;
    await import("@/instrumentation-client");
    const { config } = await import("zod/v4/core");
    expect(config().jitless).toBe(true);
    // The same object zod uses, not a copy: a later setting through zod lands beside the flag.
    expect(config()).toBe(holder.__zod_globalConfig);
  });
});
