// One place maps what a route throws to the one error shape: the core's refusals (GeometryError) as 422
// with their message; anything unexpected as 500 without details, logged.
import { beforeAll, describe, expect, inject, it, vi } from "vitest";
import { DegenerateGeometryError, GeometryError, ThreadDesignationError } from "../../geometry/errors";

let respond: typeof import("../../app/api/_lib/respond");

beforeAll(async () => {
  // The module reaches the auth library, which opens the database named here: the test server's.
  process.env.DATABASE_URL = inject("databaseURL");
  process.env.BETTER_AUTH_SECRET ??= "a-secret-for-this-worker-only-0123456789abcdef";
  respond = await import("../../app/api/_lib/respond");
});

describe("the error mapping", () => {
  it.each([
    [new DegenerateGeometryError("a plane needs at least 3 readings that are not on one line"), "a plane needs at least 3 readings that are not on one line"],
    [new ThreadDesignationError("M7x"), 'Not an ISO metric thread designation: "M7x" (expected e.g. M8 or M8x1.25)'],
    [new GeometryError("invalid-argument", "the cut is wider than the rig reaches"), "the cut is wider than the rig reaches"],
  ])("maps the core's %s to 422 with its message", async (error, message) => {
    const route = respond.handle(async () => {
      throw error;
    });
    const res = await route(new Request("http://app.test/api/v1/fit"), {});
    expect(res.status).toBe(422);
    expect(await res.json()).toEqual({ error: { code: "geometry", message } });
    expect(res.headers.get("cache-control")).toBe("no-store");
  });

  it("answers anything unexpected with 500 and no details, and logs it", async () => {
    const log = vi.spyOn(console, "error").mockImplementation(() => {});
    try {
      const route = respond.handle(async () => {
        throw new TypeError("secret internals: cannot read properties of undefined");
      });
      const res = await route(new Request("http://app.test/api/v1/fit"), {});
      expect(res.status).toBe(500);
      const text = await res.text();
      expect(text).not.toContain("secret internals");
      expect(JSON.parse(text)).toMatchObject({ error: { code: "internal" } });
      expect(log).toHaveBeenCalledTimes(1);
    } finally {
      log.mockRestore();
    }
  });
});
