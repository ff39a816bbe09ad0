// The home page's "what needs you next": one read of the club's settings per request, passed to
// every section, and the sections in order of urgency.
import { describe, expect, it, vi } from "vitest";
import { getClubSettings } from "@/server/services/accounts";
import { whatNeedsMeNext } from "@/server/services/home";
import { requestBooking, stepBooking } from "@/server/services/lending";
import { newDay } from "./antenna-day-helpers";
import { addCoaxRun, testSteward } from "./gear-helpers";
import { createPerson, wallTimeInDays } from "./helpers";

// Count the reads of the club's settings; each still goes to the database.
vi.mock("@/server/services/accounts", async (importOriginal) => {
  const actual = await importOriginal<typeof import("@/server/services/accounts")>();
  return { ...actual, getClubSettings: vi.fn(actual.getClubSettings) };
});

describe("the home page", () => {
  it("reads the club's settings once for all its sections, and puts overdue gear first", async () => {
    const coordinator = await createPerson("coordinator", { isMentor: true });
    await newDay(coordinator);
    const item = await addCoaxRun();
    const sixDaysAgo = new Date(Date.now() - 6 * 86_400_000);
    const { booking } = await requestBooking(coordinator, { itemId: item.id, startsAt: wallTimeInDays(-5, "09:00"), endsAt: wallTimeInDays(-3, "12:00") }, sixDaysAgo);
    await stepBooking(await testSteward(), booking.id, { action: "hand-out", condition: "good" }, sixDaysAgo);

    vi.mocked(getClubSettings).mockClear();
    const sections = await whatNeedsMeNext(coordinator);
    expect(getClubSettings).toHaveBeenCalledTimes(1);

    expect(sections[0].heading).toBe("Your gear");
    expect(sections[0].things[0].title).toBe(`${item.labelCode} Test coax run is overdue`);
    expect(sections.map((section) => section.heading)).toEqual(expect.arrayContaining(["The lending desk", "Antenna days still in draft", "Your next shifts", "Build sessions you mentor"]));
    // Sections with something in them come before the empty ones.
    const firstEmpty = sections.findIndex((section) => section.things.length === 0);
    expect(firstEmpty === -1 || sections.slice(firstEmpty).every((section) => section.things.length === 0)).toBe(true);
  });
});
