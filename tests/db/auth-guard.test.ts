// The pieces of the session lookup that need no server: which cookie values the process keeps as
// already verified, how a cookie is read from the header, and when a session is due for refresh.
import { describe, expect, it } from "vitest";
import { VerifiedCookies, cookieValue, refreshDue } from "@/db/auth-guard";

describe("verified session cookies", () => {
  it("keeps a cookie only when it is the token's signed form", () => {
    const kept = new VerifiedCookies();
    kept.remember("tok1.c2lnbmF0dXJl", "tok1");
    kept.remember(encodeURIComponent("tok2.sig/with+chars="), "tok2");
    kept.remember("other.signature", "tok3");
    kept.remember("tok4", "tok4");
    kept.remember("tok5.", "tok5");
    kept.remember("%E0%A4%A", "tok6");
    expect(kept.tokenOf("tok1.c2lnbmF0dXJl")).toBe("tok1");
    expect(kept.tokenOf(encodeURIComponent("tok2.sig/with+chars="))).toBe("tok2");
    expect(kept.tokenOf("other.signature")).toBeUndefined();
    expect(kept.tokenOf("tok4")).toBeUndefined();
    expect(kept.tokenOf("tok5.")).toBeUndefined();
    expect(kept.size).toBe(2);
  });

  it("forgets a cookie on request", () => {
    const kept = new VerifiedCookies();
    kept.remember("a.sig", "a");
    kept.forget("a.sig");
    expect(kept.tokenOf("a.sig")).toBeUndefined();
    expect(kept.size).toBe(0);
  });

  it("is bounded, and the least recently used cookie leaves first", () => {
    const kept = new VerifiedCookies(3);
    kept.remember("a.sig", "a");
    kept.remember("b.sig", "b");
    kept.remember("c.sig", "c");
    expect(kept.tokenOf("a.sig")).toBe("a");
    kept.remember("d.sig", "d");
    expect(kept.size).toBe(3);
    expect(kept.tokenOf("b.sig")).toBeUndefined();
    expect(kept.tokenOf("a.sig")).toBe("a");
    expect(kept.tokenOf("c.sig")).toBe("c");
    expect(kept.tokenOf("d.sig")).toBe("d");
  });
});

describe("the session cookie in a Cookie header", () => {
  it("finds the named cookie among others, by its exact name", () => {
    const header = "theme=dark; borewright.session_token=abc.def%3D; x.borewright.session_token=no";
    expect(cookieValue(header, "borewright.session_token")).toBe("abc.def%3D");
    expect(cookieValue("borewright.session_token=v", "borewright.session_token")).toBe("v");
    expect(cookieValue("theme=dark", "borewright.session_token")).toBeNull();
    expect(cookieValue(null, "borewright.session_token")).toBeNull();
    expect(cookieValue("", "borewright.session_token")).toBeNull();
  });
});

describe("the session refresh", () => {
  const day = 24 * 60 * 60;
  const now = Date.UTC(2026, 0, 10);
  it("is due once a day of the week's session has passed, not before", () => {
    const week = 7 * day;
    const fresh = new Date(now + week * 1000);
    expect(refreshDue(fresh, week, day, now)).toBe(false);
    const almostADay = new Date(now + (week - day) * 1000 + 1);
    expect(refreshDue(almostADay, week, day, now)).toBe(false);
    const aDay = new Date(now + (week - day) * 1000);
    expect(refreshDue(aDay, week, day, now)).toBe(true);
    expect(refreshDue(new Date(now), week, day, now)).toBe(true);
  });
});
