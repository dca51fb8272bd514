// Sign-in and roles as a person meets them, in Chromium against the seeded production server.
import { DEMO_PASSWORD } from "./support/env";
import { expect, signInLinkFor, test, uniqueStamp } from "./support/fixtures";

test.describe("health", () => {
  test("answers with the database kind and the newest migration", async ({ request }) => {
    const response = await request.get("/api/health");
    expect(response.status()).toBe(200);
    const body = (await response.json()) as Record<string, unknown>;
    expect(body).toMatchObject({ ok: true, database: "pglite" });
    expect(body.migration).toMatch(/^\d{4}_/);
  });
});

test.describe("staff", () => {
  test("an anonymous visit to /shop goes to sign-in", async ({ page }) => {
    await page.goto("/shop");
    await expect(page).toHaveURL((url) => url.pathname === "/sign-in" && url.searchParams.get("next") === "/shop");
  });

  test("a wrong password is refused, the right one opens the queue, signing out closes it", async ({ page }) => {
    await page.goto("/sign-in?next=/shop");
    const staff = page.getByRole("form", { name: "Staff sign-in" });
    await staff.getByLabel("E-mail").fill("tuner@sagwise.test");
    await staff.getByLabel("Password").fill("not-the-password");
    await staff.getByRole("button", { name: "Sign in" }).click();
    await expect(staff.getByRole("alert")).toContainText("do not match");

    await staff.getByLabel("Password").fill(DEMO_PASSWORD);
    await staff.getByRole("button", { name: "Sign in" }).click();
    await expect(page).toHaveURL("/shop");
    await expect(page.getByRole("heading", { level: 1 })).toHaveText("Setup requests");

    // Signing out (a form post to a server action) ends the session: the workspace asks to sign in again.
    await page.getByRole("banner").getByRole("button", { name: "Sign out" }).click();
    await expect(page).toHaveURL("/sign-in");
    await page.goto("/shop");
    await expect(page).toHaveURL((url) => url.pathname === "/sign-in" && url.searchParams.get("next") === "/shop");
  });
});

test.describe("rider", () => {
  test.use({ viewport: { width: 390, height: 844 } });

  test("signs in with an e-mail link from the mail fake and cannot open the workspace", async ({ page, mailbox }) => {
    const email = `rider-${uniqueStamp()}@example.test`;
    await page.goto("/sign-in");
    const rider = page.getByRole("form", { name: "Rider sign-in" });
    await rider.getByLabel(/E-mail/).fill(email);
    await rider.getByRole("button", { name: /sign-in link/ }).click();
    await expect(page.getByRole("status")).toContainText(email);

    const link = await signInLinkFor(mailbox, email);
    expect(await mailbox.for(email)).toHaveLength(1);

    await page.goto(link);
    await expect(page).toHaveURL("/my-requests");
    // Once on the page and once in the header (who is signed in, with a way out).
    await expect(page.getByRole("main").getByText(`Signed in as ${email}`)).toHaveCount(1);
    await expect(page.getByRole("navigation", { name: "Main" })).toContainText(`Signed in as ${email}`);

    const shop = await page.goto("/shop");
    expect(shop?.status()).toBe(403);
    const api = await page.request.get("/api/requests");
    expect(api.status()).toBe(403);
  });
});
