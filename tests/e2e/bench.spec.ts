// The antenna bench in the browser: the plan recomputes in the Web Worker when the height
// changes (the SWR chart's numbers change), and a plan is saved to the plan library.
import { randomUUID } from "node:crypto";
import { expect, test, type Page } from "@playwright/test";
import { signIn } from "./fixtures";

/** The numbers behind the 20 m SWR chart, as its accessible table gives them. */
async function swrTable(page: Page, band = "20m") {
  const table = page.getByRole("table", { name: `SWR against frequency, ${band}` });
  return table.locator("tbody").innerText();
}

test("the bench recomputes when the height changes, and saves the plan to the library", async ({ page }) => {
  await signIn(page, "member");
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Antenna bench" }).click();
  await expect(page.getByRole("heading", { name: "Antenna bench" })).toBeVisible();

  const swrAtRadio = page.locator('[data-figure="swr-centre-radio"]');
  await expect(swrAtRadio).toHaveText(/^\d+\.\d\d:1$/, { timeout: 30_000 });
  await expect(page.getByRole("table", { name: "Cut sheet" })).toBeVisible();
  await page.getByText("The numbers of this chart").first().click();
  // The engine retunes the length for resonance at the band centre, so the height shows in
  // the feed-point impedance (lower over ground, lower R) and in the whole SWR curve.
  const impedance = page.locator('[data-figure="feed-impedance"]');
  const before = { impedance: await impedance.innerText(), table: await swrTable(page) };

  await page.getByLabel("Height (m)").fill("4");
  await expect(impedance).not.toHaveText(before.impedance, { timeout: 30_000 });
  expect(await swrTable(page)).not.toBe(before.table);

  // A bad value is refused beside its field, in the engine's words, and nothing recomputes.
  await page.getByLabel("Height (m)").fill("-2");
  await expect(page.getByText("must be greater than 0")).toBeVisible();
  await expect(page.getByRole("status").filter({ hasText: "Fix the marked settings" })).toBeVisible();
  await page.getByLabel("Height (m)").fill("4");

  const name = `Bench dipole ${randomUUID().slice(0, 6)}`;
  const save = page.getByRole("form", { name: "Save to the plan library" });
  await save.getByLabel("Plan name").fill(name);
  await save.getByRole("button", { name: "Save to the library" }).click();
  await expect(save.getByText(`Saved to the plan library as “${name}”.`)).toBeVisible();

  await page.getByRole("link", { name: "Plan library" }).click();
  const row = page.getByRole("row").filter({ hasText: name });
  await expect(row).toContainText("Half-wave dipole");
  await expect(row).toContainText("not used yet");
  await row.getByRole("link", { name }).click();
  await expect(page.getByRole("heading", { name })).toBeVisible();
  await expect(page.getByText("4.00 m")).toBeVisible();
});
