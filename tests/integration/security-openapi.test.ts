// The API description is generated from the one route list (which the authorization matrix checks against
// the route modules), and is a valid OpenAPI 3.1 document by a general validator.
import { Validator } from "@seriousme/openapi-schema-validator";
import { describe, expect, it } from "vitest";
import { OPERATIONS, openApiDocument } from "../../app/api/v1/_lib/openapi";
import { Http } from "../support/http";

describe("the API description", () => {
  it("is valid OpenAPI 3.1, as generated and as served", async () => {
    const served = await new Http().get("/api/v1/openapi.json");
    expect(served.status).toBe(200);
    for (const doc of [openApiDocument(), served.json]) {
      const validator = new Validator();
      const result = await validator.validate(structuredClone(doc) as Parameters<Validator["validate"]>[0]);
      expect(result.errors ?? [], JSON.stringify(result.errors ?? [], null, 1).slice(0, 2000)).toEqual([]);
      expect(result.valid).toBe(true);
      expect(validator.version).toBe("3.1");
    }
  });

  it("describes every route of the list, with each path parameter, and the routes that were missing before", () => {
    const doc = openApiDocument() as { paths: Record<string, Record<string, { parameters?: { name: string; in: string }[] }>> };
    for (const op of OPERATIONS) {
      const described = doc.paths[op.path]?.[op.method];
      expect(described, `${op.method} ${op.path}`).toBeDefined();
      const params = [...op.path.matchAll(/\{(\w+)\}/g)].map((m) => m[1]);
      expect(described.parameters?.filter((p) => p.in === "path").map((p) => p.name) ?? []).toEqual(params);
    }
    for (const path of ["/api/v1/jobs", "/api/v1/jobs/{id}/move", "/api/v1/jobs/{id}/photos/{photoId}", "/api/v1/consult", "/api/v1/payments/checkout", "/api/v1/payments/webhook", "/api/v1/me", "/api/v1/shops"]) {
      expect(Object.keys(doc.paths)).toContain(path);
    }
  });
});
