// The words of each warning: the figures it carries (to 0.01 mm, as a caliper reads) and, where a figure can go
// either side of zero, the words for each side. What each warning tells the builder to do: common practice, no
// published source.
import { describe, expect, it } from "vitest";
import { messages, warning } from "../../geometry/warnings";

describe("warning words", () => {
  it("a warning is its code and its words", () => {
    expect(warning("cut-not-needed", "words")).toEqual({ code: "cut-not-needed", message: "words" });
  });

  it("a stud pattern that differs names the shared case studs, or else how far off the kit's studs are", () => {
    const shared = messages.studMismatch(0.4, ["a", "c"]);
    expect(shared).toContain("more than one kit stud lands on case stud a, c");
    expect(shared).toContain("will not interchange");
    const off = messages.studMismatch(0.4, []);
    expect(off).toContain("up to 0.40 mm away");
    expect(off).toContain("no cut fixes that");
  });

  it("a bit too long or too short says how much to grind off or add, for which cut", () => {
    expect(messages.bitTooLong(1.234, 57)).toBe("The installed bit is too long to cut 57.00 mm: grind at least 1.23 mm off it, or fit a shorter bit.");
    expect(messages.bitTooShort(2.5, 66)).toBe("The installed bit is too short to reach 66.00 mm: fit a bit at least 2.50 mm longer.");
  });

  it("screw heads past the cut radius say by how much; inside but too close say how close", () => {
    const past = messages.hardwareStrikes(-0.5, 1);
    expect(past).toContain("reach 0.50 mm past the cut radius");
    expect(past).toContain("stay 1.00 mm inside");
    const close = messages.hardwareStrikes(0.5, 1);
    expect(close).toContain("come within 0.50 mm of the cut radius");
    expect(close).toContain("margin wanted 1.00 mm");
    expect(messages.hardwareStrikes(0, 1)).toContain("come within 0.00 mm");
  });

  it("threads that differ name both threads", () => {
    expect(messages.threadMismatch("M7x1", "M8x1.25")).toContain("The case studs are M7x1 but the rig's studs or nuts are M8x1.25");
    expect(messages.kitThreadDiffers("M7x1", "M8x1.25")).toContain("The kit wants M8x1.25 studs but the case is threaded M7x1");
  });

  it("a tilted holder gives the tilt to 0.001° and the clearance on paper and on the worst side", () => {
    expect(messages.tiltEats(0.6, 0.3, 0.10234)).toContain("tilted 0.102°: the clearance of 0.60 mm on paper becomes 0.30 mm on the worst side");
  });

  it("a depth the stops cannot give names the wanted and the deepest travel", () => {
    expect(messages.depthStopUnreachable(27.5, 26.4)).toContain("wanted depth of 27.50 mm; the deepest travel available is 26.40 mm");
  });

  it("radial and depth clearance: below the minimum gives both figures, below zero says by how much it hits", () => {
    expect(messages.radialBelowMin(0.3, 0.5)).toBe("Radial clearance of 0.30 mm is below the minimum of 0.50 mm.");
    expect(messages.radialBelowMin(-0.2, 0.5)).toBe("The skirt would hit the cut by 0.20 mm on its worst side.");
    expect(messages.radialBelowMin(0, 0.5)).toContain("Radial clearance of 0.00 mm");
    expect(messages.depthBelowMin(0.3, 0.5)).toBe("Depth clearance of 0.30 mm is below the minimum of 0.50 mm.");
    expect(messages.depthBelowMin(-0.2, 0.5)).toContain("The cut is 0.20 mm too shallow");
    expect(messages.depthBelowMin(0, 0.5)).toContain("Depth clearance of 0.00 mm");
  });

  it("thin walls and lands name the feature, the wall left and the minimum; breaks say by how much", () => {
    expect(messages.wallBelowMin("left", 1.5, 2)).toBe("Only 1.50 mm of wall would remain to left (minimum 2.00 mm).");
    expect(messages.landBelowMin("a", 1.5, 2)).toContain("Only 1.50 mm of sealing land would remain at stud a (minimum 2.00 mm)");
    expect(messages.breaksPocket("left", 0.3)).toBe("The cut breaks 0.30 mm into left.");
    expect(messages.breaksStud("a", 0.3)).toBe("The cut breaks 0.30 mm into the hole of stud a.");
    expect(messages.breaksDeck(0.3)).toBe("The cut breaks 0.30 mm through the outside of the case.");
  });

  it("the plain warnings say what to check", () => {
    expect(messages.throughMouth()).toContain("opens into the crank chamber");
    expect(messages.cutNotNeeded()).toContain("no cut is needed");
    expect(messages.crankNotChecked()).toContain("was not checked");
    expect(messages.readingsInsufficient()).toContain("At least three holder readings");
  });

  it("a displacement class crossed gives both figures to 0.1 cc and the class", () => {
    expect(messages.crossesClass(49.26, 68.01, 50)).toContain("from 49.3 cc to 68.0 cc, across the 50 cc class");
  });

  it("a slow drill and a rocking holder give their figures", () => {
    expect(messages.drillTooSlow(449.6, 558.4)).toContain("top speed of 450 min⁻¹ is below the 558 min⁻¹");
    expect(messages.holderRocks(0.08, 0.05)).toContain("up to 0.08 mm from a flat plane (more than 0.05 mm)");
  });

  it("the crank webs: into their path says by how much, too close gives the clearance and the minimum", () => {
    expect(messages.crankBelowMin(-0.4, 1)).toContain("reaches 0.40 mm into the path of the crank webs");
    expect(messages.crankBelowMin(0.4, 1)).toContain("clears the crank webs by only 0.40 mm (minimum 1.00 mm)");
    expect(messages.crankBelowMin(0, 1)).toContain("by only 0.00 mm");
  });

  it("a passage opened to match a port: the passage or 'a passage', breaking in or a thin wall", () => {
    expect(messages.matchedWallBelowMin("intake", "left", -0.3, 2)).toContain("If left were opened to match port intake, the cut would break 0.30 mm into it");
    expect(messages.matchedWallBelowMin("intake", null, 1.2, 2)).toContain("If a passage were opened to match port intake, only 1.20 mm of wall would remain to the cut (minimum 2.00 mm)");
    expect(messages.matchedWallBelowMin("intake", "left", 0, 2)).toContain("only 0.00 mm of wall");
    expect(messages.matchedWallBelowMin("intake", null, -0.3, 2)).toContain("If a passage were opened to match port intake, the cut would break 0.30 mm into it");
  });
});
