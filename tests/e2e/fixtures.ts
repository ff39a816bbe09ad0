// Shared steps for browser tests: the demo accounts (seeded into the e2e database) and signing in.
import { expect, request as playwrightRequest, type APIRequestContext, type Page } from "@playwright/test";

export const demoPassword = "demo-antenna-day";
export const demoAccounts = {
  coordinator: "coordinator@demo.test",
  steward: "steward@demo.test",
  member: "member@demo.test",
  newcomer: "newcomer@demo.test",
} as const;
export type DemoRole = keyof typeof demoAccounts;

export async function signIn(page: Page, role: DemoRole) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(demoAccounts[role]);
  await page.getByLabel("Password").fill(demoPassword);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByRole("heading", { name: /^Hello,/ })).toBeVisible();
}

/** Signs an API request context in through next-auth's credentials endpoint (real session cookie). */
export async function signInApi(request: APIRequestContext, role: DemoRole) {
  const { csrfToken } = await (await request.get("/api/auth/csrf")).json();
  const response = await request.post("/api/auth/callback/credentials", {
    form: { csrfToken, email: demoAccounts[role], password: demoPassword, json: "true" },
  });
  expect(response.ok()).toBe(true);
}

/**
 * API request contexts for route tests, each signed in as a role (or signed out with `null`);
 * register `disposeAll` with `test.afterAll` to close them after the file's tests.
 */
export function roleContexts() {
  const contexts: APIRequestContext[] = [];
  return {
    async as(role: DemoRole | null, baseURL: string): Promise<APIRequestContext> {
      const context = await playwrightRequest.newContext({ baseURL });
      contexts.push(context);
      if (role) await signInApi(context, role);
      return context;
    },
    disposeAll: async () => {
      await Promise.all(contexts.map((context) => context.dispose()));
    },
  };
}
