// A coordinator plans an antenna day in the browser, from the empty form to publishing, with the
// site plan's fall-zone check reacting to a real mouse drag and to the keyboard; a member then
// finds the day in the calendar and signs up for a shift.
import { expect, test, type Page } from "@playwright/test";
import { signIn } from "./fixtures";

const HOME_SITE = "Wrenmoor Common, north field";

/** A date 7 to 27 days ahead (the calendar needs at most one step forward), as yyyy-mm-dd. */
const daysAhead = 7 + Math.floor(Math.random() * 21);
const date = new Date(Date.now() + daysAhead * 86_400_000).toISOString().slice(0, 10);
/** That date as the shift labels write it (formatRangeInZone, en-GB): "Sat, 13 Jun 2026". */
const shiftDate = new Intl.DateTimeFormat("en-GB", { weekday: "short", day: "numeric", month: "short", year: "numeric", timeZone: "UTC" }).format(new Date(`${date}T12:00:00Z`));
const title = `Journey day ${Date.now() % 100_000}`;

async function addSlot(page: Page, slot: { name: string; band: string; family: string; x: number; y: number; bearing: number; tent: [number, number] }) {
  await page.getByRole("link", { name: "Add a station slot" }).click();
  await expect(page.getByRole("heading", { name: `New station slot for ${title}` })).toBeVisible();
  await page.getByLabel("Station name").fill(slot.name);
  await page.getByRole("checkbox", { name: slot.band, exact: true }).check();
  await page.getByLabel("Antenna family").selectOption({ label: slot.family });
  await page.getByLabel("Mast x (m east)").fill(String(slot.x));
  await page.getByLabel("Mast y (m north)").fill(String(slot.y));
  await page.getByLabel("Wire bearing (° from north)").fill(String(slot.bearing));
  await page.getByLabel("Operating tent x (m east)").fill(String(slot.tent[0]));
  await page.getByLabel("Operating tent y (m north)").fill(String(slot.tent[1]));
  await page.getByRole("button", { name: "Save station slot" }).click();
  await expect(page.getByRole("heading", { name: title, exact: true })).toBeVisible({ timeout: 30_000 });
  await expect(page.getByRole("region", { name: `Station slot ${slot.name}` })).toBeVisible();
}

/** Where a point of the site (metres east, north) is on the screen. */
async function screenPoint(page: Page, x: number, y: number) {
  return page.locator("svg[data-depth-m]").evaluate(
    (svg, [east, north]) => {
      const depth = Number((svg as SVGSVGElement).dataset.depthM);
      const point = new DOMPoint(east, depth - north).matrixTransform((svg as SVGSVGElement).getScreenCTM()!);
      return { x: point.x, y: point.y };
    },
    [x, y],
  );
}

test("a coordinator plans, checks and publishes an antenna day; a member finds it in the calendar and signs up", async ({ browser }) => {
  test.setTimeout(240_000);
  const page = await browser.newPage();
  await signIn(page, "coordinator");
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Antenna days" }).click();
  await page.getByRole("link", { name: "New antenna day" }).click();
  await page.getByLabel("Title").fill(title);
  await page.getByLabel("Site").selectOption({ label: HOME_SITE });
  await page.getByLabel("Starts").fill(`${date}T09:00`);
  await page.getByLabel("Ends").fill(`${date}T17:00`);
  await page.getByLabel("Meeting point").fill("The west gate");
  await page.getByRole("button", { name: "Save as draft" }).click();
  await expect(page.getByRole("heading", { name: title, exact: true })).toBeVisible();
  await expect(page.getByText("Draft", { exact: true })).toBeVisible();

  await addSlot(page, { name: "Journey forty", band: "40m", family: "Half-wave dipole", x: 40, y: 70, bearing: 90, tent: [40, 55] });
  await addSlot(page, { name: "Journey twenty", band: "20m", family: "Inverted-V", x: 120, y: 60, bearing: 90, tent: [120, 45] });
  await addSlot(page, { name: "Journey fifteen", band: "15m", family: "Quarter-wave vertical with radials", x: 180, y: 42, bearing: 0, tent: [170, 42] });

  const checks = page.getByRole("region", { name: "Site plan checks" });
  await expect(checks).toContainText("0 errors");
  await expect(checks).toContainText(/harmonically related/);

  // A real mouse drag of the 40 m mast towards the power line along the north edge.
  const mast = page.getByRole("button", { name: /^Journey forty,/ });
  await mast.scrollIntoViewIfNeeded();
  const from = await screenPoint(page, 40, 70);
  const to = await screenPoint(page, 40, 140);
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  await page.mouse.move(to.x, to.y, { steps: 15 });
  await page.mouse.up();
  await expect(checks).toContainText(/Error: Journey forty: the fall zone \([\d.]+ m\) reaches the power line “11 kV line on wooden poles”/);
  await expect(page.getByText("Journey forty saved at 40 m east, 140 m north.")).toBeVisible();
  await expect(mast).toHaveAccessibleName(/has an error/);

  // The keyboard: Shift+Arrow moves 5 m; three steps south clear the line, three north bring the error back.
  await mast.focus();
  for (let step = 0; step < 3; step++) await page.keyboard.press("Shift+ArrowDown");
  await expect(checks).toContainText("0 errors");
  await expect(page.getByText("Journey forty saved at 40 m east, 125 m north.")).toBeVisible();
  for (let step = 0; step < 3; step++) await page.keyboard.press("Shift+ArrowUp");
  await expect(checks).toContainText(/Error: Journey forty: the fall zone/);
  await page.keyboard.press("ArrowDown");
  for (let step = 0; step < 4; step++) await page.keyboard.press("Shift+ArrowDown");
  await expect(checks).toContainText("0 errors");
  await expect(page.getByText("Journey forty saved at 40 m east, 119 m north.")).toBeVisible();

  // The position form does the same for those who prefer numbers.
  await page.getByLabel("Metres north (y)").fill("100");
  await page.getByRole("button", { name: "Move slot" }).click();
  await expect(page.getByText("Journey forty saved at 40 m east, 100 m north.")).toBeVisible();

  const twenty = page.getByRole("region", { name: "Station slot Journey twenty" });
  await twenty.getByLabel("Shift starts").fill(`${date}T10:00`);
  await twenty.getByLabel("Shift ends").fill(`${date}T13:00`);
  await twenty.getByLabel("Operators").fill("2");
  await twenty.getByRole("button", { name: "Add shift" }).click();
  await expect(twenty.getByText("0 of 2 places taken")).toBeVisible();

  await page.getByRole("button", { name: "Publish" }).click();
  await expect(page.getByText("The day is now published.")).toBeVisible();
  await expect(page.getByText("Published", { exact: true })).toBeVisible();
  await page.close();

  const memberPage = await browser.newPage();
  await signIn(memberPage, "member");
  await memberPage.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Antenna days" }).click();
  const calendar = memberPage.locator(".guyline-calendar");
  const entry = calendar.getByRole("link", { name: new RegExp(title) });
  // The legend comes with the entries: once it shows, this month's entries are in.
  await expect(memberPage.getByRole("list", { name: "Legend" })).toContainText("Antenna day");
  if (!(await entry.isVisible())) await calendar.getByRole("button", { name: "Next Month" }).click();
  await expect(entry).toBeVisible();
  await entry.click();
  await expect(memberPage.getByRole("heading", { name: title, exact: true })).toBeVisible();
  // Members see the plan but cannot move the masts.
  await expect(memberPage.getByRole("img", { name: /^Journey forty,/ })).toBeVisible();
  await expect(memberPage.getByRole("link", { name: "Add a station slot" })).toHaveCount(0);

  const slot = memberPage.getByRole("region", { name: "Station slot Journey twenty" });
  await slot.getByRole("button", { name: `Sign up for Journey twenty ${shiftDate}, 10:00–13:00` }).click();
  await expect(slot.getByText("You are signed up for this shift.")).toBeVisible();
  await expect(slot.getByText("1 of 2 places taken: Cleo Marchetti-Vane (Q9CLV)")).toBeVisible();
  await expect(slot.getByRole("link", { name: "Antenna plan of Journey twenty" })).toBeVisible();
  await memberPage.close();
});

test("a newcomer sees a day's shifts but is told shifts are for members", async ({ page }) => {
  await signIn(page, "newcomer");
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Antenna days" }).click();
  await page.getByRole("link", { name: "Spring antenna day" }).first().click();
  const slot = page.getByRole("region", { name: "Station slot Twenty metres" });
  await expect(slot.getByText(/Newcomers join build sessions first/).first()).toBeVisible();
  await expect(slot.getByRole("button", { name: /^Sign up/ })).toHaveCount(0);
});
