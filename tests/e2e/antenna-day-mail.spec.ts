// A published antenna day reaches the members: the coordinator publishes in the browser, the
// worker sends the announcement through the local mail server into the development inbox, and a
// member follows its link and downloads the day's calendar file.
import { readFileSync } from "node:fs";
import { expect, test } from "@playwright/test";
import ICAL from "ical.js";
import { demoAccounts, signIn, signInApi } from "./fixtures";

const HOME_SITE = "Wrenmoor Common, north field";

test("a coordinator publishes a day, the announcement reaches the development inbox, and a member downloads the day's .ics", async ({ browser }) => {
  test.setTimeout(120_000);
  const title = `Announced day ${Date.now() % 100_000}`;
  const date = new Date(Date.now() + (30 + Math.floor(Math.random() * 30)) * 86_400_000).toISOString().slice(0, 10);

  const coordinator = await browser.newContext();
  await signInApi(coordinator.request, "coordinator");
  const { sites } = await (await coordinator.request.get("/api/sites")).json();
  const site = sites.find((candidate: { name: string }) => candidate.name === HOME_SITE);
  const session = await (await coordinator.request.get("/api/auth/session")).json();
  const created = await coordinator.request.post("/api/antenna-days", {
    data: { title, siteId: site.id, startsAtLocal: `${date}T09:00`, endsAtLocal: `${date}T16:00`, meetingPoint: "The east stile", description: "", safetyLeadId: session.user.id },
  });
  expect(created.status()).toBe(201);
  const dayId: string = (await created.json()).day.id;

  const page = await coordinator.newPage();
  await page.goto(`/antenna-days/${dayId}`);
  await page.getByRole("button", { name: "Publish" }).click();
  await expect(page.getByText("The day is now published. Every member is told by e-mail.")).toBeVisible();

  // The worker delivers within seconds; the member's copy is one of the club's.
  const subject = `New antenna day: ${title}`;
  const members = page.getByRole("list", { name: "Captured messages" }).getByRole("listitem").filter({ hasText: `To ${demoAccounts.member} ·` });
  await expect(async () => {
    await page.goto("/dev/inbox");
    await expect(members.getByRole("link", { name: subject })).toBeVisible({ timeout: 1000 });
  }).toPass({ timeout: 60_000 });
  await members.getByRole("link", { name: subject }).click();
  await expect(page.getByRole("heading", { name: subject })).toBeVisible();
  await expect(page.getByText(/\.ics \(text\/calendar/)).toBeVisible();
  const text = (await page.getByTestId("text-part").textContent()) ?? "";
  expect(text).toContain("Meeting point: The east stile");
  await expect(page.frameLocator("iframe").getByRole("link", { name: "See the antenna day" })).toBeVisible();
  const link = text.match(/https?:\/\/\S+\/antenna-days\/[0-9a-f-]+/)![0];
  await coordinator.close();

  const member = await browser.newPage();
  await signIn(member, "member");
  await member.goto(link);
  await expect(member.getByRole("heading", { name: title, exact: true })).toBeVisible();
  const [download] = await Promise.all([member.waitForEvent("download"), member.getByRole("link", { name: "Add to my calendar (.ics)" }).click()]);
  const ics = readFileSync((await download.path())!, "utf8");
  const calendar = new ICAL.Component(ICAL.parse(ics));
  const vevent = calendar.getFirstSubcomponent("vevent")!;
  // Source: RFC 5545 §3.8.4.7 (UID), §3.8.1.11 (STATUS), §3.8.7.4 (SEQUENCE), §3.2.19 (TZID) and §3.6.5 (VTIMEZONE).
  expect(vevent.getFirstPropertyValue("uid")).toBe(`antenna-day-${dayId}@guyline`);
  expect(vevent.getFirstPropertyValue("status")).toBe("CONFIRMED");
  expect(vevent.getFirstPropertyValue("sequence")).toBeGreaterThanOrEqual(1);
  expect(vevent.getFirstProperty("dtstart")!.getParameter("tzid")).toBe("Europe/London");
  expect(calendar.getFirstSubcomponent("vtimezone")?.getFirstPropertyValue("tzid")).toBe("Europe/London");
  expect(download.suggestedFilename()).toMatch(/^announced-day-\d+\.ics$/);
  await member.close();
});

test("a coordinator schedules a build session from a library plan, and the plan shows where it is used", async ({ page }) => {
  test.setTimeout(90_000);
  const title = `Library inverted-V ${Date.now() % 100_000}`;
  const date = new Date(Date.now() + 40 * 86_400_000).toISOString().slice(0, 10);
  await signIn(page, "coordinator");
  await page.goto("/build-sessions/new");
  await page.getByLabel("Start from a library plan").selectOption({ label: "Club 40 m inverted-V" });
  // The plan's fields take the library plan's values.
  await expect(page.getByLabel("Antenna", { exact: true })).toHaveValue("inverted-v");
  await expect(page.getByLabel("Band")).toHaveValue("40m");
  await expect(page.getByLabel("Angle between the legs (°)")).toBeVisible();
  await page.getByLabel("Title", { exact: true }).fill(title);
  await page.getByLabel("Place", { exact: true }).fill("Club hut");
  await page.getByLabel("Starts", { exact: true }).fill(`${date}T18:00`);
  await page.getByLabel("Ends", { exact: true }).fill(`${date}T21:00`);
  await page.locator('input[name="mentorIds"]').first().check();
  await page.getByRole("button", { name: "Schedule the session" }).click();
  await expect(page.getByRole("heading", { name: title })).toBeVisible({ timeout: 30_000 });
  await page.getByRole("link", { name: "Club 40 m inverted-V" }).click();
  await expect(page.getByRole("list", { name: "Build sessions using this plan" })).toContainText(title);
});
