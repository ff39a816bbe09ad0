// A station slot's plan screen and station sheet in the browser. Members try changes on the
// plan screen (the SWR chart follows the height) and open the printable station sheet; a
// coordinator starts a slot's plan from the plan library, saves it, and the library shows
// where the plan is used.
import { expect, test, type Page } from "@playwright/test";
import { signIn } from "./fixtures";

async function openDay(page: Page, title: string) {
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Antenna days" }).click();
  await page.getByRole("link", { name: title }).first().click();
  await expect(page.getByRole("heading", { name: title })).toBeVisible();
}

test("a member changes the height on a slot's plan screen, sees the SWR change, and opens the station sheet", async ({ page }) => {
  await signIn(page, "member");
  await openDay(page, "Spring antenna day");
  await page.getByRole("link", { name: "Antenna plan of Forty metres" }).click();
  await expect(page.getByRole("heading", { name: "Forty metres: antenna plan" })).toBeVisible();
  await expect(page.locator('[data-figure="slot-bands"]')).toHaveText("40m");

  const swrAtRadio = page.locator('[data-figure="swr-centre-radio"]');
  await expect(swrAtRadio).toHaveText(/:1$/, { timeout: 30_000 });
  await page.getByText("The numbers of this chart").first().click();
  const swrTable = page.getByRole("table", { name: "SWR against frequency, 40m" });
  const before = await swrTable.locator("tbody").innerText();
  const feedlineBefore = await page.locator('[data-figure="feedline-run"]').innerText();

  await page.getByLabel("Height (m)").fill("6");
  await expect(swrTable.locator("tbody")).not.toHaveText(before, { timeout: 30_000 });
  // The feedline run follows the mast: 4 m lower, 4 m less coax.
  await expect(page.locator('[data-figure="feedline-run"]')).not.toHaveText(feedlineBefore);
  await expect(page.getByRole("button", { name: "Save this plan to the slot" })).toHaveCount(0);
  await expect(page.getByText("only a coordinator can save a plan to the slot")).toBeVisible();

  await page.getByRole("link", { name: "Station sheet" }).click();
  await expect(page.getByRole("heading", { name: "Station sheet: Forty metres" })).toBeVisible();
  await expect(page.getByRole("table", { name: /cut each piece to the bold length/ })).toBeVisible();
  await expect(page.getByRole("table", { name: "Expected SWR" })).toContainText("40m");
  await expect(page.getByRole("table", { name: "Shifts" })).toContainText("Juno");
  const safety = page.getByRole("region", { name: "Safety" });
  await expect(safety).toContainText("Power lines");
  await expect(safety).toContainText("Lightning");
  await expect(safety).toContainText("Generators");
  await expect(safety.locator("p").last()).toHaveText("Local codes and licensed practice prevail.");
  await expect(page.getByRole("button", { name: "Print this sheet" })).toBeVisible();
});

test("a coordinator starts a slot's plan from the library, saves it, and the library shows where it is used", async ({ page }) => {
  await signIn(page, "coordinator");
  await openDay(page, "Midsummer field weekend");
  await page.getByRole("link", { name: "Antenna plan of Six metres" }).click();
  await expect(page.getByRole("heading", { name: "Six metres: antenna plan" })).toBeVisible();
  await expect(page.locator('[data-figure="swr-centre-radio"]')).toHaveText(/:1$/, { timeout: 30_000 });

  await page.getByLabel("Start from a library plan").selectOption({ label: "Low 80 m dipole for the hut" });
  await expect(page.getByLabel("Antenna family")).toHaveValue("dipole");
  await expect(page.getByLabel("Height (m)")).toHaveValue("8");
  await expect(page.getByText("From the plan library: Low 80 m dipole for the hut.")).toBeVisible();
  // The slot keeps its own band: the library's dipole is recomputed for 6 m.
  await expect(page.getByRole("heading", { name: /^6m/ })).toBeVisible({ timeout: 30_000 });

  await page.getByRole("button", { name: "Save this plan to the slot" }).click();
  await expect(page.getByText("The plan is saved to the station slot.")).toBeVisible({ timeout: 30_000 });

  await page.goto("/bench/library");
  await page.getByRole("link", { name: "Low 80 m dipole for the hut" }).click();
  await expect(page.getByRole("list", { name: "Station slots using this plan" })).toContainText("Six metres on Midsummer field weekend");
});
