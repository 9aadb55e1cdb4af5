import { describe, expect, it } from "vitest";
import { ApiFailure } from "../../app/_ui/query/fetch";
import { ApiProblem } from "@/model/api-problem";

describe("an API answer in the one error shape, as an error", () => {
  it("keeps status, code, message and fields, and names its kind", () => {
    const e = new ApiFailure(409, "conflict", "Someone else changed this.", { version: "stale" });
    expect(e).toBeInstanceOf(ApiProblem);
    expect([e.status, e.code, e.message, e.fields, e.name]).toEqual([409, "conflict", "Someone else changed this.", { version: "stale" }, "ApiFailure"]);
  });
});
