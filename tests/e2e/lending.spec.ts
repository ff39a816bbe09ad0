// The lending desk in the browser: a member borrows an analyser and returns it, the history
// shows every step; the QR label sheet links to item pages that offer each role its next action;
// stewards narrow the loans to the overdue ones.
// Source: Guyline issue 5, "Tests" ("Browser: a member requests an analyser ..., the steward
// approves and hands it out, the member returns it with a note, and the history shows all of it")
// and item 2 ("Overdue loans are marked and listed for stewards").
import { expect, test, type Browser, type Page } from "@playwright/test";
import { signIn, type DemoRole } from "./fixtures";

// Each journey signs in several people in their own browser contexts: allow for a slow machine.
test.describe.configure({ timeout: 180_000 });

async function pageAs(browser: Browser, role: DemoRole): Promise<Page> {
  const context = await browser.newContext();
  const page = await context.newPage();
  await signIn(page, role);
  return page;
}

async function openItem(page: Page, labelCode: string) {
  await page.goto("/gear");
  await page.getByLabel("Search").fill(labelCode);
  await page.getByTestId(`gear-row-${labelCode}`).getByRole("link", { name: labelCode }).click();
  await expect(page.getByRole("heading", { level: 1, name: new RegExp(`^${labelCode}`) })).toBeVisible();
}

test("a member borrows an analyser for the next antenna day: request, approval, hand-out, return with a note, all in the history", async ({ browser }) => {
  const member = await pageAs(browser, "member");
  await openItem(member, "AN-03");
  await expect(member.getByTestId("next-action")).toHaveAttribute("data-action", "request");
  // The next antenna day is the first one offered; its times replace the time fields.
  const dayChoice = member.getByLabel("For an antenna day (optional)");
  await dayChoice.selectOption({ index: 1 });
  const dayTitle = (await dayChoice.locator("option:checked").innerText()).split(",")[0];
  await expect(member.getByTestId("request-day-times")).toContainText("From the day's start to its end");
  await expect(member.getByLabel("From")).toHaveCount(0);
  await member.getByLabel("What it is for (optional)").fill("Tuning the 20 m dipole");
  await member.getByRole("button", { name: "Request it" }).click();
  // The page now shows the request waiting for a steward.
  await expect(member.getByTestId("next-action")).toHaveAttribute("data-action", "awaiting");
  // exact: the form's confirmation also says "a steward will approve or decline it." while it shows.
  await expect(member.getByText("A steward will approve or decline it.", { exact: true })).toBeVisible();

  const steward = await pageAs(browser, "steward");
  await steward.goto("/lending");
  const queue = steward.getByRole("list", { name: "Requests to approve" });
  // The booking names the day it is for.
  await expect(queue.getByTestId("booking-AN-03")).toContainText(`for ${dayTitle}`);
  await queue.getByTestId("booking-AN-03").getByRole("button", { name: /^Approve/ }).click();
  // Approved, it leaves the queue.
  await expect(queue.getByTestId("booking-AN-03")).toHaveCount(0);

  await openItem(steward, "AN-03");
  const booking = steward.getByTestId("item-booking").filter({ hasText: "Cleo Marchetti-Vane" });
  await expect(booking).toContainText(`for ${dayTitle}`);
  await booking.getByRole("button", { name: /^Hand out/ }).click();
  await booking.getByLabel("Condition now").selectOption("good");
  await booking.getByRole("button", { name: "Record the hand-out" }).click();
  await expect(booking.getByText("Out", { exact: true })).toBeVisible();

  await member.reload();
  await expect(member.getByTestId("next-action")).toHaveAttribute("data-action", "return");
  await member.getByTestId("next-action").getByRole("button", { name: /^Return it/ }).click();
  await member.getByLabel("Condition now").selectOption("worn");
  await member.getByLabel("Damage or notes").fill("Battery ran low by the afternoon");
  await member.getByRole("button", { name: "Record the return" }).click();
  // Back on the shelf: the item page offers a request again.
  await expect(member.getByTestId("next-action")).toHaveAttribute("data-action", "request");

  const history = member.getByRole("list", { name: "Item history" });
  for (const step of ["Requested", "Approved", "Handed out", "Returned"]) {
    await expect(history.getByTestId("history-entry").filter({ hasText: step }).first()).toBeVisible();
  }
  await expect(history.getByText("Battery ran low by the afternoon")).toBeVisible();
  await expect(history.getByTestId("history-entry").filter({ hasText: "Handed out" }).first()).toContainText("Bram Oakhollow");
});

test("the QR label sheet links to item pages that offer each role the right next action", async ({ browser }) => {
  const steward = await pageAs(browser, "steward");
  await steward.goto("/gear/labels");
  await steward.getByRole("checkbox", { name: /^CX-02 / }).check();
  await steward.getByRole("checkbox", { name: /^AN-02 / }).check();
  await steward.getByRole("radio", { name: /US Letter/ }).check();
  await steward.getByRole("button", { name: "Show the label sheet" }).click();
  const labels = steward.getByTestId("qr-label");
  await expect(labels).toHaveCount(2);
  await expect(labels.first().locator("svg")).toBeVisible();
  const hrefOf = async (code: string) => (await labels.filter({ hasText: code }).getAttribute("href"))!;
  const coaxLink = await hrefOf("CX-02");
  const analyserLink = await hrefOf("AN-02");
  expect(coaxLink).toMatch(/^http:\/\/localhost:\d+\/gear\/[0-9a-f-]{36}$/);

  // CX-02 is out with the demo member: the steward is offered to take it back, the member to return it.
  await steward.goto(coaxLink);
  await expect(steward.getByTestId("next-action")).toHaveAttribute("data-action", "take-back");
  const member = await pageAs(browser, "member");
  await member.goto(coaxLink);
  await expect(member.getByTestId("next-action")).toHaveAttribute("data-action", "return");
  // AN-02 is free: a member may request it; a newcomer is told a mentor co-signs first.
  await member.goto(analyserLink);
  await expect(member.getByTestId("next-action")).toHaveAttribute("data-action", "request");
  const newcomer = await pageAs(browser, "newcomer");
  await newcomer.goto(analyserLink);
  await expect(newcomer.getByTestId("next-action")).toHaveAttribute("data-action", "request");
  await expect(newcomer.getByText(/borrow an analyser with a mentor's co-sign/)).toBeVisible();
});

test("a steward narrows all loans to the overdue ones", async ({ page }) => {
  await signIn(page, "steward");
  await page.goto("/lending");
  const loans = page.getByRole("table").filter({ has: page.getByRole("columnheader", { name: "Borrower" }) });
  const rows = loans.getByRole("row").filter({ has: page.getByRole("cell") });
  await expect(rows.first()).toBeVisible();
  await page.getByRole("search", { name: "Filter the loans" }).getByLabel("Overdue only").check();
  // The demo seed has BU-03 and TU-01 out past their end, and CX-02 out until tomorrow evening.
  await expect(loans.getByRole("link", { name: /^BU-03 / })).toBeVisible();
  await expect(loans.getByRole("link", { name: /^TU-01 / })).toBeVisible();
  await expect(loans.getByRole("link", { name: /^CX-02 / })).toHaveCount(0);
  for (const row of await rows.all()) await expect(row.getByText("Overdue", { exact: true })).toBeVisible();
});
