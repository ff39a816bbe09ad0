import { expect, test } from "@playwright/test";
import { demoAccounts, signIn, type DemoRole } from "./fixtures";

// What each role's navigation offers (product.md, "Roles").
const navigationByRole: Record<DemoRole, string[]> = {
  coordinator: ["Antenna days", "Antenna bench", "Gear shelf", "Lending desk", "Build sessions", "Members", "Settings"],
  steward: ["Antenna days", "Antenna bench", "Gear shelf", "Lending desk", "Build sessions", "Settings"],
  member: ["Antenna days", "Antenna bench", "Gear shelf", "Lending desk", "Build sessions", "Settings"],
  newcomer: ["Antenna days", "Antenna bench", "Gear shelf", "Lending desk", "Build sessions", "Settings"],
};

for (const role of Object.keys(demoAccounts) as DemoRole[]) {
  test(`${role} signs in and sees the ${role}'s navigation`, async ({ page }) => {
    await signIn(page, role);
    const links = page.getByRole("navigation", { name: "Main" }).getByRole("link");
    await expect(links).toHaveText(navigationByRole[role]);
  });
}

for (const role of ["steward", "member", "newcomer"] as const) {
  test(`${role} gets the 403 page on the members page`, async ({ page }) => {
    await signIn(page, role);
    const response = await page.goto("/members");
    expect(response?.status()).toBe(403);
    await expect(page.getByRole("heading", { name: "Not for your role (403)" })).toBeVisible();
  });
}

test("a signed-out visitor is sent to sign in, and back afterwards", async ({ page }) => {
  await page.goto("/settings");
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=%2Fsettings/);
  await page.getByLabel("E-mail").fill(demoAccounts.member);
  await page.getByLabel("Password").fill("demo-antenna-day");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByRole("heading", { name: "Settings" })).toBeVisible();
});

test("a wrong password and an unknown e-mail each get a clear message", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(demoAccounts.member);
  await page.getByLabel("Password").fill("not the right password");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByText("That password is not right for this account.")).toBeVisible();
  await page.getByLabel("E-mail").fill("nobody-here@demo.test");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByText(/No Guyline account uses this e-mail address/)).toBeVisible();
});

test("joining: a bad join code and a short password are named; a good one lands a newcomer", async ({ page }) => {
  await page.goto("/join");
  await page.getByLabel("Join code").fill("WRONG-CODE");
  await page.getByLabel("Your name").fill("Pat Newfield");
  await page.getByLabel("E-mail").fill(`pat-${Date.now()}@demo.test`);
  await page.getByLabel("Password").fill("too short");
  await page.getByRole("button", { name: "Join" }).click();
  await expect(page.getByText(/Use at least 15 characters/)).toBeVisible();
  await page.getByLabel("Password").fill("a long enough passphrase");
  // The form re-checks the field when it loses focus and the message goes, moving the button
  // up: leave the field first, or the click lands where the button was.
  await page.getByLabel("Password").press("Tab");
  await expect(page.getByText(/Use at least 15 characters/)).toBeHidden();
  await page.getByRole("button", { name: "Join" }).click();
  await expect(page.getByText(/That join code is not right/)).toBeVisible();
  await page.getByLabel("Join code").fill("WREN-ANTENNA-26");
  await page.getByRole("button", { name: "Join" }).click();
  await expect(page.getByText(/A coordinator still has to confirm your account/)).toBeVisible();
  await expect(page.getByRole("navigation", { name: "Main" }).getByRole("link")).toHaveText(["Settings"]);
});

test("unknown pages get the 404 page", async ({ page }) => {
  await signIn(page, "member");
  const response = await page.goto("/no-such-page");
  expect(response?.status()).toBe(404);
  await expect(page.getByRole("heading", { name: "Page not found (404)" })).toBeVisible();
});

test("the health check answers", async ({ request }) => {
  const response = await request.get("/api/health");
  expect(response.status()).toBe(200);
  expect(await response.json()).toEqual({ ok: true, db: "up" });
});
