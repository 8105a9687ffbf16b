import { expect, type Page } from "@playwright/test";

/** The demo seed's accounts (db/seed); demo data only. */
export const DEMO_USERS = {
  admin: { email: "admin@leeway.example", password: "leeway-admin" },
  planner: { email: "planner@leeway.example", password: "leeway-planner" },
  trainer: { email: "trainer@leeway.example", password: "leeway-trainer" },
  council: { email: "council@leeway.example", password: "leeway-council" },
} as const;

export type DemoRole = keyof typeof DEMO_USERS;

/** Signs in through the real form and waits for the workspace. */
export async function signIn(page: Page, role: DemoRole) {
  const { email, password } = DEMO_USERS[role];
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("current-user")).toBeVisible();
}
