import { describe, expect, it } from "vitest";
import { dayChanges, dayNotice, descriptionExcerpt, type DayFacts } from "@/lib/antenna-days/day-notices";

const facts: DayFacts = {
  title: "Summer antenna day",
  // 08:00Z is 09:00 on London's wall clock in June (BST).
  startsAt: new Date("2026-06-13T08:00:00Z"),
  endsAt: new Date("2026-06-13T16:00:00Z"),
  siteName: "Hollow Lane field",
  meetingPoint: "The north gate",
  description: "Four stations.",
  safetyLeadName: "Ada",
};

describe("which message a change of an antenna day sends", () => {
  it("announces a day when it is published and tells members of changes and a cancellation after that", () => {
    expect(dayNotice("draft", "published")).toBe("published");
    expect(dayNotice("published", "published")).toBe("changed");
    expect(dayNotice("published", "cancelled")).toBe("cancelled");
  });

  it("says nothing about drafts nobody saw, or a day marked done", () => {
    expect(dayNotice("draft", "draft")).toBeNull();
    expect(dayNotice("draft", "cancelled")).toBeNull();
    expect(dayNotice("published", "done")).toBeNull();
  });
});

describe("what changed, in words", () => {
  it("names a new time on the club's wall clock with the old one", () => {
    // Source: IANA Time Zone Database, Europe/London (BST = UTC+1 in June).
    const later = { ...facts, startsAt: new Date("2026-06-13T09:00:00Z"), endsAt: new Date("2026-06-13T17:00:00Z") };
    expect(dayChanges(facts, later, "Europe/London")).toEqual(["New time: Sat, 13 Jun 2026, 10:00–18:00 (was Sat, 13 Jun 2026, 09:00–17:00)"]);
  });

  it("lists each change members see, and nothing when nothing changed", () => {
    expect(dayChanges(facts, facts, "Europe/London")).toEqual([]);
    const changed = { ...facts, siteName: "Ridge car park", meetingPoint: "", title: "Summer day", safetyLeadName: "Bram", description: "Five stations." };
    expect(dayChanges(facts, changed, "Europe/London")).toEqual([
      "New site: Ridge car park (was Hollow Lane field)",
      "The meeting point is no longer set: see the day's page.",
      "New name: Summer day (was Summer antenna day)",
      "New safety lead: Bram",
      "The description changed: see the day's page.",
    ]);
  });
});

describe("a description's excerpt", () => {
  it("keeps a short description, drops an empty one and cuts a long one at a word", () => {
    expect(descriptionExcerpt("  Four stations.  ")).toBe("Four stations.");
    expect(descriptionExcerpt("   ")).toBeNull();
    expect(descriptionExcerpt("one two three four five six", 12)).toBe("one two…");
  });
});
