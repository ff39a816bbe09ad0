// Sign-in help end to end: a person who forgot their password asks for a link, the worker sends
// it through the local mail server into the development inbox, and the link sets a new password
// once and signs them in. Source: Guyline issue 6 (sign-in help is always sent) and
// NIST SP 800-63B-4 §3.1.1.2 (at least 15 characters for a password used on its own).
import { expect, test, type Browser } from "@playwright/test";
import { signIn } from "./fixtures";

async function joinAsNewcomer(browser: Browser, email: string, password: string) {
  const page = await browser.newPage();
  await page.goto("/join");
  await page.getByLabel("Join code").fill("WREN-ANTENNA-26");
  await page.getByLabel("Your name").fill("Robin Forgetful");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Join" }).click();
  await expect(page.getByText(/A coordinator still has to confirm your account/)).toBeVisible();
  await page.close();
}

test("a person who forgot their password gets a link by e-mail, chooses a new one and is signed in", async ({ browser }) => {
  test.setTimeout(120_000);
  const email = `forgetful-${Date.now()}@demo.test`;
  await joinAsNewcomer(browser, email, "the first passphrase I forgot");

  const visitor = await browser.newPage();
  await visitor.goto("/sign-in");
  await visitor.getByRole("link", { name: "Forgot your password?" }).click();
  // The sign-in page has an "E-mail" field too: wait for the new page before filling.
  await expect(visitor.getByRole("heading", { level: 1, name: "Forgot your password?" })).toBeVisible();
  await visitor.getByLabel("E-mail").fill(email);
  await visitor.getByRole("button", { name: "Send me a link" }).click();
  await expect(visitor.getByText(/a link to choose a new password is on its way/)).toBeVisible();

  const coordinator = await browser.newPage();
  await signIn(coordinator, "coordinator");
  const message = coordinator.getByRole("list", { name: "Captured messages" }).getByRole("listitem").filter({ hasText: `To ${email} ·` });
  await expect(async () => {
    await coordinator.goto("/dev/inbox");
    await expect(message.getByRole("link", { name: "Choose a new Guyline password" })).toBeVisible({ timeout: 1000 });
  }).toPass({ timeout: 60_000 });
  await message.getByRole("link", { name: "Choose a new Guyline password" }).click();
  const text = (await coordinator.getByTestId("text-part").textContent()) ?? "";
  const link = text.match(/https?:\/\/\S+\/reset-password\/\S+/)![0];
  await coordinator.close();

  await visitor.goto(link);
  await visitor.getByLabel("New password").fill("short");
  await visitor.getByRole("button", { name: "Set my new password" }).click();
  await expect(visitor.getByText(/Use at least 15 characters/)).toBeVisible();
  await visitor.getByLabel("New password").fill("a new passphrase to remember");
  await visitor.getByLabel("New password").press("Tab");
  await visitor.getByRole("button", { name: "Set my new password" }).click();
  await expect(visitor.getByRole("heading", { name: /^Hello,/ })).toBeVisible({ timeout: 30_000 });

  // The link works once.
  const again = await browser.newPage();
  await again.goto(link);
  await expect(again.getByRole("heading", { name: "This link has expired" })).toBeVisible();
  await expect(again.getByLabel("New password")).toHaveCount(0);
});
