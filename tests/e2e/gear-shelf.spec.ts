// The gear shelf in the browser: a steward adds an item with its kind's details, edits it,
// adds a photo and retires it; a member sees the shelf but not the keepers' controls.
// Source: Guyline issue 5, item 1 ("Stewards add, edit and retire items").
import { expect, test } from "@playwright/test";
import { signIn } from "./fixtures";

test.describe.configure({ timeout: 180_000 });

// Source: W3C PNG Specification (Third Edition), §5.2 PNG signature.
const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52]);

test("a steward adds, edits, photographs and retires a mast", async ({ page }) => {
  const code = `MS-${Date.now().toString(36).slice(-5).toUpperCase()}`;
  await signIn(page, "steward");
  await page.goto("/gear");
  await page.getByRole("link", { name: "Add an item" }).click();
  // Choosing the kind shows its details once the form is live (retried in case it was not yet).
  await expect(async () => {
    await page.getByLabel("Kind").selectOption("mast");
    await expect(page.getByLabel("Height (m)")).toBeVisible({ timeout: 1_000 });
  }).toPass();
  await page.getByLabel("Label code").fill(code.toLowerCase());
  await page.getByLabel("Name").fill("Telescopic test mast, 9 m");
  await page.getByLabel("Kept in").fill("Mast rack");
  await page.getByRole("button", { name: "Add the item" }).click();
  // The mast's own details are required.
  await expect(page.getByText("Enter the height.")).toBeVisible();
  await page.getByLabel("Height (m)").fill("9");
  await page.getByLabel("Guy kit").fill("2 levels × 3 guys");
  await page.getByRole("button", { name: "Add the item" }).click();
  await expect(page.getByRole("heading", { level: 1, name: `${code} · Telescopic test mast, 9 m` })).toBeVisible();
  await expect(page.getByText("9 m, guys: 2 levels × 3 guys")).toBeVisible();
  await expect(page.getByText("Masts can fall")).toBeVisible();

  await page.getByRole("link", { name: "Edit" }).click();
  await page.getByLabel("Kept in").fill("Trailer");
  await page.getByRole("button", { name: "Save the item" }).click();
  await expect(page.getByRole("definition").filter({ hasText: "Trailer" })).toBeVisible();

  await page.getByLabel("File").setInputFiles({ name: "mast.png", mimeType: "image/png", buffer: png });
  await page.getByRole("button", { name: "Upload" }).click();
  await expect(page.getByRole("img", { name: /Photo of Telescopic test mast/ })).toBeVisible();

  await page.getByLabel("Why retire it?").fill("Lower section cracked");
  await page.getByRole("button", { name: "Retire the item" }).click();
  await expect(page.getByText("This item is retired.")).toBeVisible();
  const history = page.getByRole("list", { name: "Item history" });
  for (const step of ["Added to the shelf", "Edited", "Photo added", "Retired"]) await expect(history.getByText(step, { exact: true })).toBeVisible();

  await page.goto("/gear");
  await page.getByLabel("Kind").selectOption("mast");
  await expect(page.getByTestId("gear-row-MA-01")).toBeVisible();
  await expect(page.getByTestId(`gear-row-${code}`)).toHaveCount(0);
  await page.getByLabel("Show retired items").check();
  await expect(page.getByTestId(`gear-row-${code}`)).toBeVisible();
});

test("a member sees the shelf without the keepers' controls", async ({ page }) => {
  await signIn(page, "member");
  await page.goto("/gear");
  await expect(page.getByTestId("gear-row-AN-01")).toBeVisible();
  await expect(page.getByRole("link", { name: "Add an item" })).toHaveCount(0);
  // A filter chosen on a later page shows the first page of what it matches.
  await page.getByRole("button", { name: "Next page" }).click();
  await expect(page.getByText(/^Page 2 of /)).toBeVisible();
  await page.getByRole("search", { name: "Filter the shelf" }).getByLabel("Kind").selectOption({ label: "Antenna analyser" });
  await expect(page.getByText(/^Page 1 of 1 /)).toBeVisible();
  await expect(page.getByTestId("gear-row-AN-01")).toBeVisible();
  expect((await page.goto("/gear/new"))?.status()).toBe(403);
  expect((await page.goto("/gear/labels"))?.status()).toBe(403);
});
