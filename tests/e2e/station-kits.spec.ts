// Station kits in the browser: the coordinator books a slot's coax run from the suggestions,
// each with the engine's loss and SWR for that run, and the slot's plan then names that run.
// Source: Guyline issue 5, "Tests" ("Browser: ... the coordinator books a station kit from the
// suggested coax runs").
import { expect, test } from "@playwright/test";
import { signIn } from "./fixtures";

test.describe.configure({ timeout: 180_000 });

test("the coordinator books a station kit from the suggested coax runs", async ({ page }) => {
  await signIn(page, "coordinator");
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Antenna days" }).click();
  await page.getByRole("link", { name: "Spring antenna day" }).first().click();
  await page.getByRole("link", { name: "Station kits" }).click();
  await expect(page.getByRole("heading", { name: "Station kits: Spring antenna day" })).toBeVisible();

  const slot = page.getByRole("region", { name: "Station kit for Twenty metres" });
  const runs = slot.getByRole("table", { name: "Coax runs for Twenty metres" });
  // The engine computes each candidate run: its loss in dB and the SWR at the radio.
  await expect(runs).toBeVisible({ timeout: 90_000 });
  const best = runs.locator("tbody tr").first();
  await expect(best).toContainText("CX-13 RG-213 run, 35 m");
  await expect(best.locator('[data-figure="candidate-loss"]')).toHaveText(/^\d+\.\d\d dB$/);
  await expect(best.locator('[data-figure="candidate-swr"]')).toHaveText(/^\d+\.\d\d:1 \(worst \d+\.\d\d:1\)$/);
  // Runs too short for the 30.8 m feedline run are not offered.
  await expect(runs).not.toContainText("CX-01");

  await slot.getByRole("button", { name: "Book CX-13 for Twenty metres" }).click();
  await expect(slot.getByText("CX-13 RG-213 run, 35 m is booked for the slot as its feedline.")).toBeVisible();
  await expect(slot.getByTestId("slot-feedline")).toHaveText("feedline: CX-13 RG-213 run, 35 m, RG-213, 35 m");
  await expect(slot.getByTestId("kit-booking-CX-13")).toContainText("Approved");
  await expect(slot.getByTestId("current-run")).toContainText("The plan uses the booked run CX-13", { timeout: 90_000 });

  await page.getByRole("link", { name: "Back to the day" }).click();
  await page.getByRole("link", { name: "Antenna plan of Twenty metres" }).click();
  await expect(page.locator('[data-figure="slot-feedline"]')).toContainText("feedline: CX-13 RG-213 run, 35 m, RG-213, 35 m");
  await expect(page.locator('[data-figure="feedline-run"]')).toHaveText("35.0 m (the booked coax run)");
  await page.getByRole("link", { name: "Station sheet" }).click();
  await expect(page.locator('[data-figure="slot-feedline"]')).toHaveText("feedline: CX-13 RG-213 run, 35 m, RG-213, 35 m", { timeout: 30_000 });
});
