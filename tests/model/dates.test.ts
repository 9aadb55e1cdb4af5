import { describe, expect, it } from "vitest";
import { dateText, dateTimeText, isTimeZone, timeText } from "@/model/dates";

// Zone offsets from the IANA time zone database (tz): Europe/Berlin is UTC+1 in winter and UTC+2 in summer
// (daylight saving time from the last Sunday of March); America/New_York is UTC−5 in winter.

describe("dates and times", () => {
  it("writes one instant in the shop's zone, with the zone named", () => {
    const at = "2026-12-02T13:00:00.000Z";
    expect(dateTimeText(at, "UTC")).toBe("2 Dec 2026, 13:00 UTC");
    expect(dateTimeText(at, "Europe/Berlin")).toBe("2 Dec 2026, 14:00 Europe/Berlin");
    expect(dateTimeText(at, "America/New_York")).toBe("2 Dec 2026, 08:00 America/New_York");
  });

  it("follows daylight saving time and crosses midnight into the zone's own date", () => {
    expect(timeText("2026-07-01T12:00:00Z", "Europe/Berlin")).toBe("14:00 Europe/Berlin");
    expect(dateText("2026-03-01T23:30:00Z", "Europe/Berlin")).toBe("2 Mar 2026");
    expect(dateText(Date.UTC(2026, 0, 1, 2, 0), "America/New_York")).toBe("31 Dec 2025");
  });

  it("writes midnight as 00:00, takes a Date, a number or ISO text, and a dash for no valid instant", () => {
    const midnight = new Date(Date.UTC(2026, 4, 9, 0, 5));
    expect(timeText(midnight, "UTC")).toBe("00:05 UTC");
    expect(dateTimeText(midnight.getTime(), "UTC")).toBe(dateTimeText(midnight.toISOString(), "UTC"));
    expect(dateTimeText("not a date", "UTC")).toBe("—");
  });

  it("knows a zone name from a typo", () => {
    expect(isTimeZone("Europe/Berlin")).toBe(true);
    expect(isTimeZone("Europe/Berlinn")).toBe(false);
  });
});
