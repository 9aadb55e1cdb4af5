// The depth stop in the bench's words. Travel = groove travel − the shim stack under the ring (the core's
// rule, geometry/depth-stop.ts: common practice, no published source); the sums below are worked by hand.
import { describe, expect, it } from "vitest";
import { chooseDepthStop } from "@/geometry";
import { SHORT_SHAFT_RIG } from "@/db/seed-library";
import { depthStopSentence, shimBreakdown } from "@/model/depth-stop-words";
import { RigDataSchema } from "@/model/schemas";

// The demo shop's short-shaft bench rig (invented): grooves at 22, 26 and 30 mm; shims 5 × 0.10, 4 × 0.50, 4 × 1.00 mm.
const RIG = RigDataSchema.parse(SHORT_SHAFT_RIG.data);

describe("the depth stop sentence", () => {
  it("names the groove, the stack under the ring and where it stops: 26 − (2 × 0.10 + 0.50) = 25.30 mm", () => {
    const ds = chooseDepthStop(25.3, RIG, 0.005);
    expect(ds.groove).toBe("groove 2");
    expect(depthStopSentence(ds, "mm")).toBe("ring in groove 2 with 0.70 mm of shims: stops at 25.30 mm");
    expect(shimBreakdown(ds, "mm")).toBe("shims: 2 × 0.10 + 1 × 0.50 mm");
  });

  it("never writes the shims as a sum added to the groove", () => {
    const ds = chooseDepthStop(25.3, RIG, 0.005);
    expect(depthStopSentence(ds, "mm")).not.toMatch(/groove 2 \+|\d×/);
  });

  it("in inches: 0.70 mm = 0.028 in, 25.30 mm = 0.996 in (÷ 25.4, the exact inch of NIST SP 811 B.8)", () => {
    const ds = chooseDepthStop(25.3, RIG, 0.005);
    expect(depthStopSentence(ds, "in")).toBe("ring in groove 2 with 0.028 in of shims: stops at 0.996 in");
    expect(shimBreakdown(ds, "in")).toBe("shims: 2 × 0.004 + 1 × 0.020 in");
  });

  it("a groove that gives the depth as it is: no shims, and no breakdown", () => {
    const ds = chooseDepthStop(26, RIG, 0.005);
    expect(depthStopSentence(ds, "mm")).toBe("ring in groove 2, no shims: stops at 26.00 mm");
    expect(shimBreakdown(ds, "mm")).toBeNull();
  });

  it("a depth past the deepest groove says it cannot be reached and the most there is (30.00 mm)", () => {
    const ds = chooseDepthStop(31, RIG, 0.005);
    expect(ds.reached).toBe(false);
    expect(depthStopSentence(ds, "mm")).toBe("cannot stop at 31.00 mm with the grooves and shims at hand (the most is 30.00 mm)");
    expect(shimBreakdown(ds, "mm")).toBeNull();
  });
});
