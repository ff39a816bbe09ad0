import { readFileSync } from "node:fs";
import { expect, test, type APIRequestContext } from "@playwright/test";
import ICAL from "ical.js";
import { demoAccounts, signIn, signInApi } from "./fixtures";

const inDays = (days: number, time: string) => `${new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10)}T${time}`;

const plan = {
  family: "dipole",
  band: "20m",
  region: 1,
  heightM: 8,
  wireDiameterMm: 1.6,
  ground: "average",
  feedline: { type: "rg58", lengthM: 15 },
  transmitter: { powerW: 100, mode: "ssb" },
};

async function scheduleOnePlaceSession(request: APIRequestContext, title: string): Promise<string> {
  const { sessions } = await (await request.get("/api/build-sessions")).json();
  const mentorId = sessions[0].mentors[0].id as string;
  const response = await request.post("/api/build-sessions", {
    data: { title, plan, startsAt: inDays(20, "10:00"), endsAt: inDays(20, "13:00"), place: "Village hall", capacity: 1, mentorIds: [mentorId] },
  });
  expect(response.status()).toBe(201);
  return (await response.json()).id;
}

test("a newcomer joins a full session's waitlist, is promoted when a place frees up, gets the message and the .ics", async ({ browser, page }) => {
  const title = `One-place dipole ${Date.now()}`;
  const coordinator = await browser.newContext();
  await signInApi(coordinator.request, "coordinator");
  const sessionId = await scheduleOnePlaceSession(coordinator.request, title);

  const member = await browser.newContext();
  await signInApi(member.request, "member");
  expect((await member.request.post(`/api/build-sessions/${sessionId}/signup`)).status()).toBe(201);

  await signIn(page, "newcomer");
  await page.goto(`/build-sessions/${sessionId}`);
  await expect(page.getByText("Full (1 places)")).toBeVisible();
  await expect(page.getByRole("heading", { name: "Cut sheet" })).toBeVisible();
  await expect(page.getByRole("link", { name: "Request it from the lending desk" }).first()).toHaveAttribute("href", "/lending");
  await page.getByRole("button", { name: "Join the waitlist" }).click();
  // exact: the action's own confirmation also says "you are number 1 on the waitlist." while it shows.
  await expect(page.getByText("You are number 1 on the waitlist.", { exact: true })).toBeVisible();

  expect((await member.request.delete(`/api/build-sessions/${sessionId}/signup`)).status()).toBe(200);
  await page.reload();
  await expect(page.getByText("You have a place at this session.")).toBeVisible();

  // The coordinator reads the development inbox; the worker delivers within seconds.
  const inbox = await coordinator.newPage();
  const subject = `A place freed up: ${title}`;
  await expect(async () => {
    await inbox.goto("/dev/inbox");
    await expect(inbox.getByRole("link", { name: subject })).toBeVisible({ timeout: 1000 });
  }).toPass({ timeout: 30_000 });
  await inbox.getByRole("link", { name: subject }).click();
  await expect(inbox.getByRole("heading", { name: subject })).toBeVisible();
  await expect(inbox.getByText(demoAccounts.newcomer, { exact: true })).toBeVisible();
  const text = (await inbox.getByTestId("text-part").textContent()) ?? "";
  expect(text).toContain(`/build-sessions/${sessionId}`);
  await expect(inbox.frameLocator("iframe").getByRole("link", { name: "See the session" })).toBeVisible();

  // The message's link resolves to the session page.
  const link = text.match(/https?:\/\/\S+\/build-sessions\/[0-9a-f-]+/)![0];
  await page.goto(link);
  await expect(page.getByRole("heading", { name: title })).toBeVisible();

  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Add to my calendar (.ics)" }).click()]);
  const ics = readFileSync((await download.path())!, "utf8");
  const vevent = new ICAL.Component(ICAL.parse(ics)).getFirstSubcomponent("vevent")!;
  // Source: RFC 5545 §3.8.4.7 (UID), §3.8.1.11 (STATUS), §3.2.19 (TZID).
  expect(vevent.getFirstPropertyValue("uid")).toBe(`build-session-${sessionId}@guyline`);
  expect(vevent.getFirstPropertyValue("status")).toBe("CONFIRMED");
  expect(vevent.getFirstProperty("dtstart")!.getParameter("tzid")).toBe("Europe/London");
  expect(download.suggestedFilename()).toMatch(/^one-place-dipole-\d+\.ics$/);

  await coordinator.close();
  await member.close();
});

test("build-session and calendar routes answer 401, 403, 404 and 400 as documented", async ({ playwright, baseURL }) => {
  const anonymous = await playwright.request.newContext({ baseURL });
  expect((await anonymous.get("/api/build-sessions")).status()).toBe(401);
  expect((await anonymous.get("/api/calendar/no-such-feed-token-at-all")).status()).toBe(404);
  expect((await anonymous.post("/api/unsubscribe/u1.bad.token")).status()).toBe(404);

  const newcomer = await playwright.request.newContext({ baseURL });
  await signInApi(newcomer, "newcomer");
  const forbidden = await newcomer.post("/api/build-sessions", { data: { title: "Nope", plan, startsAt: inDays(9, "10:00"), endsAt: inDays(9, "12:00"), place: "Hall", capacity: 2, mentorIds: [] } });
  expect(forbidden.status()).toBe(400);
  const { sessions } = await (await newcomer.get("/api/build-sessions")).json();
  const mentorId = sessions[0].mentors[0].id;
  const asNewcomer = await newcomer.post("/api/build-sessions", { data: { title: "Nope", plan, startsAt: inDays(9, "10:00"), endsAt: inDays(9, "12:00"), place: "Hall", capacity: 2, mentorIds: [mentorId] } });
  expect(asNewcomer.status()).toBe(403);
  expect((await newcomer.get("/api/build-sessions/00000000-0000-4000-8000-000000000000")).status()).toBe(404);

  const coordinator = await playwright.request.newContext({ baseURL });
  await signInApi(coordinator, "coordinator");
  const bad = await coordinator.post("/api/build-sessions", { data: { title: "Bad band", plan: { ...plan, band: "11m" }, startsAt: inDays(9, "10:00"), endsAt: inDays(9, "12:00"), place: "Hall", capacity: 2, mentorIds: [mentorId] } });
  expect(bad.status()).toBe(400);
  expect((await bad.json()).problems.map((problem: { path: string }) => problem.path)).toContain("plan.band");

  await anonymous.dispose();
  await newcomer.dispose();
  await coordinator.dispose();
});

test("the development inbox is for coordinators only", async ({ page }) => {
  await signIn(page, "member");
  const response = await page.goto("/dev/inbox");
  expect(response?.status()).toBe(403);
});

test("a member subscribes to their calendar feed from the settings page", async ({ page, playwright, baseURL }) => {
  await signIn(page, "member");
  await page.goto("/settings");
  await page.getByRole("button", { name: /Make (my calendar address|a new address)/ }).click();
  const url = await page.getByLabel("Your private calendar address").inputValue();
  const anonymous = await playwright.request.newContext({ baseURL });
  const feed = await anonymous.get(url);
  expect(feed.status()).toBe(200);
  expect(feed.headers()["content-type"]).toContain("text/calendar");
  expect(await feed.text()).toContain("BEGIN:VCALENDAR");
  await page.getByRole("button", { name: "Stop my calendar feed" }).click();
  await expect(page.getByText("Your calendar address no longer works.")).toBeVisible();
  expect((await anonymous.get(url)).status()).toBe(404);
  await anonymous.dispose();
});
