// The rider's side at phone size (390×844): numbers typed with a decimal comma, one set of sag terms
// and reading labels, the signed-in rider, the unknown link, the earlier reports, the favicon, the fonts.
import AxeBuilder from "@axe-core/playwright";
import type { Page } from "@playwright/test";
import { tinyPng } from "../fixtures/images";
import { expect, signInLinkFor, signInWithPassword, test, uniqueStamp } from "./support/fixtures";
import { answersLike } from "./support/requests";

test.use({ viewport: { width: 390, height: 844 } });

async function expectAccessible(page: Page, what: string) {
  const result = await new AxeBuilder({ page }).analyze();
  const bad = result.violations.filter((v) => v.impact === "serious" || v.impact === "critical");
  expect(bad.map((v) => `${what}: ${v.id} (${v.impact})`)).toEqual([]);
}

const stepHeading = (page: Page) => page.getByRole("heading", { level: 2, name: /^Step \d of 5/ });

test.describe("numbers with a decimal comma", () => {
  test("the request form takes 86,5 kg and the review shows 86.5 kg", async ({ page }) => {
    await page.goto("/request");
    await page.evaluate(() => window.localStorage.clear());
    await page.reload();
    await page.getByLabel("Your name").fill("Comma Rider");
    await page.getByLabel("E-mail").fill(`comma.${uniqueStamp()}@example.test`);
    await page.getByLabel("Your weight").fill("86,5");
    await page.getByRole("radio", { name: "Advanced" }).check();
    await page.getByRole("radio", { name: "In between" }).check();
    await page.getByRole("button", { name: "Next" }).click();
    await expect(page.getByText("Enter the weight as a number")).toHaveCount(0);
    await expect(stepHeading(page)).toContainText("Step 2 of 5");
    await page.getByLabel("Hours ridden per month (optional)").fill("7,5");
    await page.getByRole("radio", { name: "Enduro" }).check();
    await page.getByRole("radio", { name: "Small (under 10 m)" }).check();
    await page.getByRole("button", { name: "Next" }).click();
    await expect(stepHeading(page)).toContainText("Step 3 of 5");
    await expectAccessible(page, "bike step");
  });

  test("the sag report takes 33,5 and 104,5 mm", async ({ page, submitRequest, staffApi }) => {
    const { id, statusUrl } = await submitRequest(
      answersLike("r09", { name: "Comma Sagreport", email: `comma.sag.${uniqueStamp()}@example.test` }),
    );
    const tuner = await staffApi("tuner@sagwise.test");
    expect((await tuner.post(`/api/requests/${id}/approve`, { data: {} })).ok()).toBe(true);
    await page.goto(statusUrl);
    const form = page.getByRole("form", { name: "Report measured sag" });
    await form.getByRole("group", { name: "Sag unit" }).getByText("mm").click();
    await form.getByLabel("Rear static sag").fill("33,5");
    await form.getByLabel("Rear race sag").fill("104,5");
    await form.getByRole("button", { name: "Check my sag" }).click();
    // Read as 33.5 and 104.5 mm: the engine answers with a verdict instead of refusing the figures.
    await expect(form.getByRole("status")).toHaveText(/Shock: (Spring is (right|too soft|too stiff)|Measure again)/);
    await expect(page.getByRole("region", { name: "Your earlier reports" })).toContainText(
      "Rear: static sag 33.5 mm, race sag 104.5 mm",
    );
    await expectAccessible(page, "status page after a sag report");
  });
});

test.describe("the rider's pages", () => {
  test("a new sag report is listed under 'Your earlier reports' at once, with its readings", async ({
    page,
    submitRequest,
    staffApi,
  }) => {
    const { id, statusUrl } = await submitRequest(
      answersLike("r09", { name: "Listed Sagreport", email: `listed.${uniqueStamp()}@example.test` }),
    );
    const tuner = await staffApi("tuner@sagwise.test");
    expect((await tuner.post(`/api/requests/${id}/approve`, { data: {} })).ok()).toBe(true);
    await page.goto(statusUrl);
    await expect(page.getByRole("heading", { name: "Your earlier reports" })).toHaveCount(0);
    const form = page.getByRole("form", { name: "Report measured sag" });
    await form.getByRole("group", { name: "Sag unit" }).getByText("mm").click();
    await form.getByLabel("Rear static sag").fill("34");
    await form.getByLabel("Rear race sag").fill("105");
    await form.getByRole("button", { name: "Check my sag" }).click();
    const earlier = page.getByRole("region", { name: "Your earlier reports" });
    await expect(earlier.getByRole("listitem")).toHaveCount(1);
    await expect(earlier).toContainText("Rear: static sag 34 mm, race sag 105 mm");
    await expect(earlier).toContainText(/Shock: (Spring is|Measure again)/);
    // The same after a reload: it was stored, not only shown.
    await page.reload();
    await expect(page.getByRole("region", { name: "Your earlier reports" }).getByRole("listitem")).toHaveCount(1);
  });

  test("an unknown status link answers 404 with the friendly page", async ({ page }) => {
    const response = await page.goto("/status/not-a-real-token-not-a-real-token-000");
    expect(response?.status()).toBe(404);
    await expect(page.getByRole("heading", { level: 1 })).toHaveText("This link does not open a request");
    await expectAccessible(page, "unknown status link");
  });

  test("a rider signed in by e-mail link sees who they are and can sign out", async ({ page, mailbox }) => {
    const email = "hana.whitlock@example.test";
    await page.goto("/sign-in");
    const signIn = page.getByRole("form", { name: "Rider sign-in" });
    await signIn.getByLabel(/E-mail/).fill(email);
    await signIn.getByRole("button", { name: /sign-in link/ }).click();
    await expect(page.getByRole("status")).toContainText(email);
    await page.goto(await signInLinkFor(mailbox, email));
    await expect(page).toHaveURL("/my-requests");
    const nav = page.getByRole("navigation", { name: "Main" });
    await expect(nav).toContainText(`Signed in as ${email}`);
    await expect(nav.getByRole("link", { name: "Sign in" })).toHaveCount(0);
    const width = await page.evaluate(() => document.documentElement.scrollWidth);
    expect(width).toBeLessThanOrEqual(390);
    await expectAccessible(page, "my requests, signed in");
    await nav.getByRole("button", { name: "Sign out" }).click();
    await expect(page).toHaveURL("/");
    await expect(page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Sign in" })).toHaveCount(1);
    await page.goto("/my-requests");
    await expect(page).toHaveURL(/\/sign-in/);
  });

  test("the draft banner asks for photos again only when some were picked; the icon is served", async ({ page }) => {
    await page.goto("/request");
    await page.evaluate(() => window.localStorage.clear());
    await page.reload();
    await page.getByLabel("Your name").fill("Banner Rider");
    await page.reload();
    const banner = page.getByRole("status").filter({ hasText: "We kept your answers from last time" });
    await expect(banner).toHaveCount(1);
    await expect(banner).not.toContainText("photo");

    // A photo picked on the bike step, then a reload: the file is gone and the banner says so.
    await page.evaluate(() => {
      const draft = JSON.parse(window.localStorage.getItem("sagwise.request-draft.v1")!);
      window.localStorage.setItem("sagwise.request-draft.v1", JSON.stringify({ ...draft, step: 2, reached: 2 }));
    });
    await page.reload();
    await page
      .getByLabel(/^Photos of the bike/)
      .setInputFiles({ name: "bike.png", mimeType: "image/png", buffer: Buffer.from(tinyPng()) });
    await expect(page.getByRole("button", { name: "Remove bike.png" })).toHaveCount(1);
    await page.reload();
    await expect(banner).toContainText("(the photo has to be added again)");

    const icon = await page.locator('link[rel="icon"]').first().getAttribute("href");
    expect(icon).toBeTruthy();
    const served = await page.request.get(icon!);
    expect(served.status()).toBe(200);
    expect(served.headers()["content-type"]).toContain("image/svg+xml");
  });

  test("the form downloads the upright font only; the italic waits for a page that shows it", async ({ page }) => {
    const fonts: string[] = [];
    page.on("request", (r) => {
      if (r.resourceType() === "font") fonts.push(new URL(r.url()).pathname);
    });
    await page.goto("/request");
    await page.waitForLoadState("networkidle");
    expect(fonts).toHaveLength(1);
    expect(fonts[0]).toMatch(/inter_latin_wght_normal/);
    expect(await page.locator('link[rel="preload"][as="font"]').count()).toBe(1);
  });
});

test.describe("the shop's wording of the rider e-mails", () => {
  test.use({ viewport: { width: 1280, height: 900 } });
  test("the owner previews a wording, is told what is wrong with a bad one, and saves", async ({ page }) => {
    await signInWithPassword(page, "owner@sagwise.test", "/shop/emails");
    await page.getByRole("link", { name: "Write the rider e-mails in your shop's words" }).click();
    await expect(page).toHaveURL("/shop/emails/wording");
    const form = page.getByRole("form", { name: "Request declined, with the reason" });
    await form.getByLabel("Opening paragraph").fill("Sorry {name}, request {request} is not one for us:");
    await form.getByRole("button", { name: "Preview" }).click();
    await expect(form.getByText("Only {rider}, {request} and {shop} can be filled in")).toHaveCount(1);
    await form.getByLabel("Opening paragraph").fill("Sorry {rider}, request {request} is not one for us:");
    await form.getByRole("button", { name: "Preview" }).click();
    const frame = form.frameLocator("iframe");
    await expect(frame.getByText("Sorry Alex Demo, request 1042 is not one for us:")).toHaveCount(1);
    await form.getByRole("button", { name: "Save" }).click();
    await expect(form.getByRole("status")).toHaveText("Saved: the next e-mails of this kind use this wording.");
    await page.reload();
    await expect(
      page.getByRole("form", { name: "Request declined, with the reason" }).getByLabel("Opening paragraph"),
    ).toHaveValue("Sorry {rider}, request {request} is not one for us:");
    await expectAccessible(page, "e-mail wording");
  });
});

test.describe("after the first rides", () => {
  test("the rider says how it rides; the tuner sends the revised sheet in one step", async ({
    page,
    submitRequest,
    staffApi,
    newVisitor,
  }) => {
    const { id, statusUrl } = await submitRequest(
      answersLike("r09", { name: "Ride Feedback", email: `ride.${uniqueStamp()}@example.test` }),
    );
    const tuner = await staffApi("tuner@sagwise.test");
    expect((await tuner.post(`/api/requests/${id}/approve`, { data: {} })).ok()).toBe(true);
    await page.goto(statusUrl);
    const form = page.getByRole("form", { name: "How the bike rides now" });
    await form.getByRole("button", { name: "Tell the shop" }).click();
    await expect(form.getByText("Tick what you feel at either end, or tell us in your words")).toHaveCount(1);
    await form.getByRole("checkbox", { name: "Front: Bottoms out" }).check();
    await form.getByLabel("In your words (optional)").fill("Still bottoms on the big double.");
    await form.getByRole("button", { name: "Tell the shop" }).click();
    await expect(form.getByRole("status")).toContainText("Fork compression:");
    await expect(form.getByRole("status")).toContainText("Bottoming: firm fork compression 2 clicks");
    await expectAccessible(page, "status page with ride feedback");

    const staff = await newVisitor();
    const shop = await staff.newPage();
    await signInWithPassword(shop, "tuner@sagwise.test", `/shop/requests/${id}`);
    const panel = shop.getByRole("region", { name: "After the first rides" });
    await expect(panel).toContainText("Front: Bottoms out");
    // The rider's own words are quoted in Inter's italic face, fetched for this page only.
    const quote = panel.getByText("“Still bottoms on the big double.”");
    await expect(quote).toHaveCSS("font-style", "italic");
    expect(await quote.evaluate((el) => getComputedStyle(el).fontFamily)).toMatch(/interItalic/);
    await expect.poll(() => quote.evaluate(() => document.fonts.check('italic 16px "interItalic"'))).toBe(true);
    await panel.getByRole("button", { name: "Send the revised sheet with these changes" }).click();
    await expect(panel).toContainText("Answered with version 2.");
  });
});
