// The rider's side in Chromium at phone size (390×844) against the seeded production server: the
// whole request in lb and inches with a reload mid-way, the status link from the e-mail, the sag
// follow-up on an approved request, axe-core on every public page, and approval → sheet download →
// sag report. Tests that need an approved request submit and approve one of their own.
import AxeBuilder from "@axe-core/playwright";
import type { Page } from "@playwright/test";
import { stableUuid } from "@/db/seed-data";
import { demoStatusToken } from "@/lib/requests/token";
import type { RequestAnswersInput } from "@/lib/validations/request";
import { tinyPng } from "../fixtures/images";
import { E2E_AUTH_SECRET } from "./support/env";
import { expect, signInLinkFor, test, uniqueStamp } from "./support/fixtures";
import { answersLike } from "./support/requests";

const demoToken = (key: string) => demoStatusToken(E2E_AUTH_SECRET, stableUuid(`request:${key}`));
const DRAFT_KEY = "sagwise.request-draft.v1";

test.use({ viewport: { width: 390, height: 844 } });

/** Nothing may be wider than the phone's screen. */
async function expectNoSideways(page: Page) {
  const width = await page.evaluate(() => document.documentElement.scrollWidth);
  expect(width).toBeLessThanOrEqual(390);
}

async function expectAccessible(page: Page, what: string) {
  const result = await new AxeBuilder({ page }).analyze();
  const bad = result.violations.filter((v) => v.impact === "serious" || v.impact === "critical");
  expect(bad.map((v) => `${what}: ${v.id} (${v.impact}) ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`)).toEqual(
    [],
  );
}

const stepHeading = (page: Page) => page.getByRole("heading", { level: 2, name: /^Step \d of 5/ });

test.describe("a rider's setup request", () => {
  test("completes every step in lb and inches, keeps the draft over a reload, submits and opens the e-mailed link", async ({
    page,
    mailbox,
    baseURL,
  }) => {
    const email = `phone.rider.${uniqueStamp()}@example.test`;
    await page.goto("/");
    await expectNoSideways(page);
    await page.getByRole("link", { name: "Start my setup request" }).click();
    await expect(page).toHaveURL("/request");
    await expect(stepHeading(page)).toContainText("Step 1 of 5");

    // A step refuses to move on with errors shown beside the fields.
    await page.getByRole("button", { name: "Next" }).click();
    await expect(page.getByText("Enter your name")).toHaveCount(1);
    await expect(page.getByText("Enter your e-mail address")).toHaveCount(1);

    await page.getByLabel("Your name").fill("Phone Rider");
    await page.getByLabel("E-mail").fill(email);
    await expect(page.getByLabel("E-mail")).toHaveAttribute("inputmode", "email");
    await page.getByLabel("Your weight").fill("185");
    await expect(page.getByLabel("Your weight")).toHaveAttribute("inputmode", "decimal");
    await page.getByRole("group", { name: "Weight unit" }).getByText("lb").click();
    await page.getByLabel("That weight includes my riding gear").check();
    await page.getByLabel("Height (optional)").fill("70");
    await page.getByRole("group", { name: "Height unit" }).getByText("in").click();
    await page.getByRole("radio", { name: "Advanced" }).check();
    await page.getByRole("radio", { name: "In between" }).check();
    await expectNoSideways(page);
    await page.getByRole("button", { name: "Next" }).click();
    await expect(stepHeading(page)).toContainText("Step 2 of 5");

    await page.getByRole("radio", { name: "Enduro" }).check();
    await page.getByRole("checkbox", { name: "Rocky" }).check();

    // Mid-way: the tab reloads (or the signal drops). Nothing typed is lost.
    await page.reload();
    await expect(stepHeading(page)).toContainText("Step 2 of 5");
    await expect(page.getByText("We kept your answers from last time", { exact: false })).toHaveCount(1);
    await expect(page.getByRole("radio", { name: "Enduro" })).toBeChecked();
    await expect(page.getByRole("checkbox", { name: "Rocky" })).toBeChecked();
    // Back through the step indicator to the first step: still filled in, lb still chosen.
    await page.getByRole("navigation", { name: "Form steps" }).getByRole("button", { name: /You/ }).click();
    await expect(page.getByLabel("Your name")).toHaveValue("Phone Rider");
    await expect(page.getByRole("radio", { name: "lb" })).toBeChecked();
    await page.getByRole("button", { name: "Next" }).click();
    await expect(stepHeading(page)).toContainText("Step 2 of 5");

    await page.getByRole("checkbox", { name: "Roots" }).check();
    await page.getByRole("radio", { name: "Small (under 10 m)" }).check();
    await page.getByLabel("Hours ridden per month (optional)").fill("12");
    await page.getByRole("button", { name: "Next" }).click();
    await expect(stepHeading(page)).toContainText("Step 3 of 5");

    // The picker searches the shop's catalog; this rider's bike is not in it.
    await page.getByLabel("Search the shop's list").fill("300");
    await expect(page.getByRole("radio", { name: /300 two-stroke enduro/ })).toHaveCount(1);
    await expect(page.getByRole("radio", { name: /450 four-stroke/ })).toHaveCount(0);
    await page.getByRole("radio", { name: "My bike is not listed" }).check();
    await page.getByLabel("Make, size and type").fill("350 four-stroke enduro, 2019");
    await page.getByLabel("Rear wheel travel").fill("12.8");
    await page.getByRole("group", { name: "Rear travel unit" }).getByText("in").click();
    await page.getByLabel("Fork travel").fill("11.8");
    await page.getByRole("group", { name: "Fork travel unit" }).getByText("in").click();
    await page.getByLabel("Bike weight, ready to ride (optional)").fill("245");
    await page.getByRole("group", { name: "Bike weight unit" }).getByText("lb").click();
    await page.getByLabel("Year (optional)").fill("2019");
    await page
      .getByLabel(/^Photos of the bike/)
      .setInputFiles({ name: "bike.png", mimeType: "image/png", buffer: Buffer.from(tinyPng()) });
    await expect(page.getByRole("button", { name: "Remove bike.png" })).toHaveCount(1);
    await expectNoSideways(page);
    await page.getByRole("button", { name: "Next" }).click();
    await expect(stepHeading(page)).toContainText("Step 4 of 5");

    await page.getByRole("checkbox", { name: "Bottoms out" }).check();
    await page.getByRole("group", { name: "Sag unit" }).getByText("in").click();
    await page.getByLabel("Rear static sag (the bike on its own weight, no rider)").fill("1.4");
    await page.getByLabel("Rear race sag (you aboard in full gear)").fill("4.3");
    await page.getByRole("button", { name: "Review" }).click();
    await expect(stepHeading(page)).toContainText("Step 5 of 5");

    // The review shows everything as given, units included.
    const review = page.getByRole("form", { name: "Review and send" });
    for (const text of [
      "185 lb (with gear)",
      "70 in",
      "Enduro",
      "Rocky, Roots",
      "350 four-stroke enduro, 2019 (not in the shop's list)",
      "12.8 in",
      "245 lb",
      "rear static sag 1.4 in, rear race sag 4.3 in",
      "1 photo: bike.png",
    ]) {
      await expect(review.getByText(text, { exact: false }).first(), text).toBeVisible();
    }
    await page.getByRole("button", { name: "Send my request" }).click();
    await expect(page.getByText("Agree to be contacted about this request")).toHaveCount(1);
    await page.getByLabel(/The shop may contact me/).check();
    const posted = page.waitForResponse(
      (r) => r.url() === `${baseURL}/api/requests` && r.request().method() === "POST",
    );
    await page.getByRole("button", { name: "Send my request" }).click();
    const response = await posted;
    expect(response.status()).toBe(201);
    const body = (await response.json()) as { id: string; statusUrl: string };
    await expect(page).toHaveURL(/\/status\/[A-Za-z0-9_-]+\?sent=1$/);
    await expect(page.getByRole("status").first()).toContainText("Request sent");
    expect(await page.evaluate((key) => window.localStorage.getItem(key), DRAFT_KEY)).toBeNull();

    // The confirmation e-mail carries the private link; it opens this request.
    await expect.poll(async () => (await mailbox.for(email)).length).toBe(1);
    const [confirmation] = await mailbox.for(email);
    const link = /href="([^"]*\/status\/[A-Za-z0-9_-]+)"/.exec(confirmation!.html ?? "")?.[1];
    expect(link).toBe(`${baseURL}${body.statusUrl}`);
    await page.goto(link!);
    await expect(page.getByRole("heading", { level: 1 })).toHaveText(/^Request \d+$/);
    await expect(page.getByText("Submitted", { exact: true })).toHaveCount(1);
    await expect(page.getByText("A tuner will look at your request soon.")).toHaveCount(1);
    await expect(page.getByText("185 lb (with gear)")).toHaveCount(1);
    const img = page.getByRole("img", { name: "Photo 1: bike.png" });
    const src = await img.getAttribute("src");
    const photo = await page.request.get(src!);
    expect(photo.status()).toBe(200);
    expect(photo.headers()["content-type"]).toBe("image/png");
    expect(Buffer.from(await photo.body())).toEqual(Buffer.from(tinyPng()));
    await expectNoSideways(page);
  });

  test("reports measured sag on an approved request and gets the verdict at once", async ({
    page,
    submitRequest,
    staffApi,
  }) => {
    const stamp = uniqueStamp();
    const { id, statusUrl } = await submitRequest(
      answersLike("r09", { name: "Dario Sagreport", email: `sag.${stamp}@example.test` }),
    );
    const tuner = await staffApi("tuner@sagwise.test");
    const approved = await tuner.post(`/api/requests/${id}/approve`, { data: {} });
    expect(approved.ok(), `approve answered ${approved.status()}`).toBe(true);
    const token = statusUrl.split("/").pop()!;

    await page.goto(statusUrl);
    await expect(page.getByText("Approved", { exact: true })).toHaveCount(1);
    const sheet = page.getByRole("link", { name: "Download setup sheet, version 1 (PDF)" });
    await expect(sheet).toHaveAttribute("href", `/api/requests/${id}/sheet?version=1&token=${token}`);
    // The cautions sit where the rider will work on springs.
    const safety = page.getByRole("note", { name: "Safety" });
    await expect(safety).toContainText("gas-charged shocks store energy");
    await expect(safety).toContainText("manufacturer's service manual");
    await expect(page.getByRole("img", { name: /race sag = A − C/ })).toHaveCount(1);

    const form = page.getByRole("form", { name: "Report measured sag" });
    await form.getByRole("group", { name: "Sag unit" }).getByText("in").click();
    await form.getByLabel("Rear static sag").fill("1.5");
    await form.getByLabel("Rear race sag").fill("1.2");
    await form.getByRole("button", { name: "Check my sag" }).click();
    await expect(
      form.getByText(
        "Race sag (you aboard in full gear) must be larger than static sag (the bike on its own weight, no rider)",
      ),
    ).toHaveCount(1);

    await form.getByLabel("Rear race sag").fill("4.1");
    await form.getByLabel("Front static sag").fill("1.2");
    await form.getByLabel("Front race sag").fill("2.3");
    await form.getByRole("button", { name: "Check my sag" }).click();
    const verdict = form.getByRole("status");
    await expect(verdict).toHaveText(/Shock: Spring is (right|too soft|too stiff)/);
    await expect(verdict).toHaveText(/Fork: Spring is (right|too soft|too stiff)/);
    await expect(page.getByText("Your earlier reports")).toHaveCount(1);
    await expectNoSideways(page);
  });
});

test.describe("accessibility of the public pages (axe-core)", () => {
  test("has no serious or critical violations on any public page", async ({ page, mailbox }) => {
    const pages: [string, string][] = [
      ["landing", "/"],
      ["request form", "/request"],
      ["sign-in", "/sign-in"],
      ["status: submitted", `/status/${demoToken("r01")}`],
      ["status: waiting for rider", `/status/${demoToken("r07")}`],
      ["status: approved with sag form", `/status/${demoToken("r10")}`],
      ["status: declined", `/status/${demoToken("r12")}`],
      ["status: unknown link", "/status/not-a-real-token-not-a-real-token"],
    ];
    for (const [what, path] of pages) {
      await page.goto(path);
      await page.waitForLoadState("networkidle");
      await expectAccessible(page, what);
      await expectNoSideways(page);
    }
    // Every step of the form, walked with the validation errors showing on the first one.
    await page.goto("/request");
    await page.evaluate(() => window.localStorage.clear());
    await page.reload();
    await page.getByRole("button", { name: "Next" }).click();
    await expect(page.getByText("Enter your name")).toHaveCount(1);
    await expectAccessible(page, "request form with errors");
    for (const step of [1, 2, 3, 4]) {
      await page.evaluate(
        ([key, s]) => {
          const draft = { version: 1, step: s, reached: 4, values: {}, savedAt: new Date().toISOString() };
          window.localStorage.setItem(key, JSON.stringify(draft));
        },
        [DRAFT_KEY, step] as const,
      );
      await page.reload();
      await expect(stepHeading(page)).toContainText(`Step ${step + 1} of 5`);
      await page.waitForLoadState("networkidle");
      await expectAccessible(page, `request form step ${step + 1}`);
      await expectNoSideways(page);
    }
    await page.evaluate(() => window.localStorage.clear());

    // My requests, signed in with an e-mail link, and one request opened from there without a token.
    const email = "hana.whitlock@example.test";
    await page.goto("/sign-in");
    const rider = page.getByRole("form", { name: "Rider sign-in" });
    await rider.getByLabel(/E-mail/).fill(email);
    await rider.getByRole("button", { name: /sign-in link/ }).click();
    await expect(page.getByRole("status")).toContainText(email);
    await page.goto(await signInLinkFor(mailbox, email));
    await expect(page).toHaveURL("/my-requests");
    await expectAccessible(page, "my requests");
    await page.getByRole("link", { name: /^Request \d+ · 300 two-stroke enduro/ }).click();
    await expect(page).toHaveURL(`/my-requests/${stableUuid("request:r10")}`);
    await expect(page.getByText("Approved", { exact: true })).toHaveCount(1);
    await expect(page.getByRole("link", { name: "Download setup sheet, version 1 (PDF)" })).toHaveAttribute(
      "href",
      `/api/requests/${stableUuid("request:r10")}/sheet?version=1`,
    );
    await expectAccessible(page, "my request");
    await expectNoSideways(page);
    // Another rider's request does not open for this session.
    await page.goto(`/my-requests/${stableUuid("request:r09")}`);
    await expect(page.getByRole("heading", { level: 1 })).toHaveText("No such request for this e-mail");
    await expect(page.getByText("Dario Lindqvist")).toHaveCount(0);
  });
});

// The answers the form test above types, as the form sends them (lb and inches, a bike not listed).
const PHONE_RIDER_ANSWERS = (email: string): RequestAnswersInput => ({
  rider: {
    name: "Phone Rider",
    email,
    weight: { value: 185, unit: "lb" },
    gearIncluded: true,
    height: { value: 70, unit: "in" },
    skill: "advanced",
    style: "moderate",
  },
  riding: { discipline: "enduro", terrain: ["rocky", "roots"], jumpSize: "small", hoursPerMonth: 12 },
  bike: {
    modelId: null,
    notListed: {
      description: "350 four-stroke enduro, 2019",
      rearWheelTravel: { value: 12.8, unit: "in" },
      forkTravel: { value: 11.8, unit: "in" },
      mass: { value: 245, unit: "lb" },
    },
    year: 2019,
  },
  feel: { complaints: ["bottoming"], currentSag: { unit: "in", rearStatic: 1.4, rearRace: 4.3 } },
  review: { consent: true },
});

test.describe("after a staff approval", () => {
  test("the rider downloads the approved sheet from the status page and reports sag", async ({
    page,
    submitRequest,
    staffApi,
  }) => {
    const created = await submitRequest(PHONE_RIDER_ANSWERS(`phone.rider.${uniqueStamp()}@example.test`));
    const tuner = await staffApi("tuner@sagwise.test");
    const approved = await tuner.post(`/api/requests/${created.id}/approve`, { data: {} });
    expect(approved.ok(), `approve answered ${approved.status()}`).toBe(true);

    await page.goto(created.statusUrl);
    await expect(page.getByText("Approved", { exact: true })).toHaveCount(1);
    const href = await page.getByRole("link", { name: "Download setup sheet, version 1 (PDF)" }).getAttribute("href");
    const sheet = await page.request.get(href!);
    expect(sheet.status()).toBe(200);
    expect(sheet.headers()["content-type"]).toContain("application/pdf");
    expect(
      Buffer.from(await sheet.body())
        .subarray(0, 5)
        .toString("latin1"),
    ).toBe("%PDF-");

    const form = page.getByRole("form", { name: "Report measured sag" });
    await form.getByRole("group", { name: "Sag unit" }).getByText("in").click();
    await form.getByLabel("Rear static sag").fill("1.4");
    await form.getByLabel("Rear race sag").fill("4.3");
    await form.getByRole("button", { name: "Check my sag" }).click();
    await expect(form.getByRole("status")).toHaveText(/Shock: Spring is (right|too soft|too stiff)/);
  });
});
