// A member who operated a station on the past antenna day uploads the analyser's sweep of it:
// the columns the header names are wrong, so the preview refuses the file with the line; the
// member corrects the mapping, uploads, and sees the measured sweep over the plan's charts with
// the comparison and the trim advice. Then the library plan the slot came from shows the offset.
import { expect, test } from "@playwright/test";
import { signIn } from "./fixtures";

/** A feed-point sweep of a 40 m antenna resonating at 7.02 MHz, whose header swaps R and X. */
const csv = ["Freq (MHz),R (ohm),X (ohm)", ...Array.from({ length: 51 }, (_, i) => {
  const mhz = 6.8 + i * 0.01;
  return `${mhz.toFixed(2)},${(480 * (mhz - 7.02)).toFixed(1)},${(55 + 60 * (mhz - 7.02)).toFixed(1)}`;
})].join("\n");

test("a member uploads a sweep, corrects the detected columns, and sees the overlay and the trim advice", async ({ page }) => {
  await signIn(page, "member");
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Antenna days" }).click();
  await page.getByRole("link", { name: "Autumn antenna day" }).first().click();
  await page.getByRole("link", { name: "Antenna plan of Forty metres" }).click();
  await expect(page.getByRole("heading", { name: "Forty metres: antenna plan" })).toBeVisible();

  // The upload form starts open while a slot has no sweeps.
  if (!(await page.getByLabel("Sweep file").isVisible())) await page.getByText("Upload a sweep", { exact: true }).click();
  await page.getByLabel("Sweep file").setInputFiles({ name: "forty-before.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });
  // The header says column 2 is R: its negative values cannot be a resistance.
  await expect(page.getByLabel("R column")).toHaveValue("1");
  await expect(page.getByText(/line 2: R -105\.6 Ω is negative/)).toBeVisible();

  await page.getByLabel("R column").selectOption({ label: "Column 3 (X (ohm))" });
  await page.getByLabel("X column").selectOption({ label: "Column 2 (R (ohm))" });
  await expect(page.locator('[data-figure="preview-points"]')).toHaveText("Read with these columns: 51 points from 6.8000 to 7.3000 MHz.");

  await page.getByLabel("At the feed point (on the coax side of the balun or unun)").check();
  await page.getByLabel("Analyser").selectOption({ label: "AN-01: Field analyser, 1–60 MHz (1–60 MHz)" });
  await page.getByLabel("Note (optional)").fill("Before trimming");
  await page.getByRole("button", { name: "Upload the sweep" }).click();

  await expect(page).toHaveURL(/\?sweep=[0-9a-f-]{36}$/);
  const history = page.getByRole("table", { name: "Sweeps of this antenna" });
  await expect(history).toContainText("Before trimming");
  await expect(history).toContainText("AN-01");
  await expect(page.locator('[data-figure="measured-resonance"]')).toHaveText("7.020 MHz");
  await expect(page.locator('[data-figure="resonance-shift"]')).toHaveText(/^−\d+ kHz \(−\d\.\d\d %\)$/);
  await expect(page.locator('[data-figure="verdict"]')).toHaveText("Resonates low: the wire is long");
  await expect(page.locator('[data-figure="measured-bandwidth"]')).toContainText("kHz");
  await expect(page.locator('[data-figure="trim-first-step"]').first()).toHaveText(/^cut \d\.\d{3} m$/);
  await expect(page.getByRole("list", { name: "What to do" })).toContainText("Cut half the change first and measure again");

  // The plan screen draws the measured sweep over the prediction.
  await expect(page.getByText("At the feed point, measured").first()).toBeVisible({ timeout: 30_000 });
  await expect(page.getByText("R, measured").first()).toBeVisible();

  // The library plan the slot was built from learns the offset.
  await page.goto("/bench/library");
  await page.getByRole("link", { name: "Club 40 m inverted-V" }).click();
  await expect(page.getByRole("table", { name: "Measured offsets" })).toContainText("Forty metres");
  await expect(page.getByRole("heading", { name: "Start the next cut from the measured offset" })).toBeVisible();
  await expect(page.locator('[data-figure="next-cut"]').first()).toHaveText(/ m$/);
});
