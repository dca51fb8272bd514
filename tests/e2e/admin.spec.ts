// Shop administration in the browser: the admin adds a bike with a progressive leverage curve through
// the catalog form; a bike like it is listed in the catalog, and a rider's request on it is sized on it;
// an invited tuner joins and is signed out when deactivated. Each test adds its own bike or account.
import type { APIRequestContext } from "@playwright/test";
import { stableUuid } from "@/db/seed-data";
import { expect, signInWithPassword, test, uniqueLetters, uniqueStamp } from "./support/fixtures";

const OWNER = "owner@sagwise.test";

// Ratio falling linearly 3.0 → 2.0 over 300 mm: shock travel x(y) = 300·ln(3/(3 − y/300)), so the
// stroke is 300·ln 1.5 = 121.64 mm (calculus; leverage ratio = dy/dx by definition).
const CURVE: [number, number][] = [
  [0, 3],
  [100, 2.6667],
  [200, 2.3333],
  [300, 2],
];
const STROKE = "121.64";

const bikeName = () => `E2E progressive 350 ${uniqueStamp()}`;

/** Adds a bike with the progressive curve through the catalog API: a seeded generic class's spec
 * with the rear end above. Returns its id. */
async function addProgressiveBike(api: APIRequestContext, name: string): Promise<string> {
  const seeded = await api.get(`/api/shop/catalog/${stableUuid("bike:mx-450-4t")}`);
  expect(seeded.status()).toBe(200);
  const { spec } = (await seeded.json()) as { spec: { rear: Record<string, unknown> } };
  const rear = {
    ...spec.rear,
    wheelTravelMm: 300,
    shockStrokeMm: Number(STROKE),
    leverageCurve: CURVE.map(([wheelTravelMm, ratio]) => ({ wheelTravelMm, ratio })),
  };
  const created = await api.post("/api/shop/catalog", {
    data: { name, bikeClass: "enduro-350-4t", spec: { ...spec, rear } },
  });
  expect(created.status(), `adding the bike answered ${await created.text()}`).toBe(201);
  return ((await created.json()) as { id: string }).id;
}

test.describe("admin catalog", () => {
  test("the admin sees the admin-only pages in the navigation", async ({ page }) => {
    await signInWithPassword(page, OWNER, "/shop/catalog");
    const nav = page.getByRole("navigation", { name: "Workspace" });
    for (const label of ["Catalog", "Stock", "Tools", "Targets", "Team", "Settings"])
      await expect(nav.getByRole("link", { name: label, exact: true }), label).toHaveCount(1);
  });

  test("refuses a curve that misses the stroke, then saves a progressive curve", async ({ page }) => {
    const name = bikeName();
    await signInWithPassword(page, OWNER, "/shop/catalog");
    await page.getByRole("link", { name: "Add a bike" }).click();
    await expect(page).toHaveURL("/shop/catalog/new");
    const form = page.getByRole("form", { name: "Bike model" });
    await form.getByLabel("Name", { exact: true }).fill(name);
    await form.getByLabel("Class", { exact: true }).selectOption({ label: "A class of the shop's own" });
    await form.getByLabel("Own class name").fill("enduro-350-4t");
    await form.getByLabel("Rear wheel travel (mm)").fill("300");
    // The template has 7 points; keep 4.
    for (const n of [7, 6, 5]) await form.getByRole("button", { name: `Remove point ${n}` }).click();
    for (const [i, [y, ratio]] of CURVE.entries()) {
      await form.getByLabel(`Point ${i + 1} wheel travel (mm)`).fill(String(y));
      await form.getByLabel(`Point ${i + 1} leverage ratio`).fill(String(ratio));
    }
    await form.getByLabel("Shock stroke (mm)").fill("140");
    await expect(form.getByRole("status").first()).toContainText("does not match the stroke");
    await form.getByRole("button", { name: "Add bike" }).click();
    await expect(form.locator("#spec\\.rear\\.shockStrokeMm-error")).toHaveText(/tolerance 2\.1 mm/);

    await form.getByLabel("Shock stroke (mm)").fill(STROKE);
    await expect(form.getByRole("status").first()).toContainText("Curve matches the stroke");
    await form.getByRole("button", { name: "Add bike" }).click();
    await expect(page).toHaveURL(/\/shop\/catalog\/[0-9a-f-]{36}$/);
    const bikeId = page.url().split("/").pop()!;
    await expect(page.getByRole("heading", { level: 1 })).toHaveText(name);

    const saved = await page.request.get(`/api/shop/catalog/${bikeId}`);
    expect(saved.status()).toBe(200);
    const model = (await saved.json()) as {
      rearWheelTravelMm: number;
      spec: { rear: { shockStrokeMm: number; leverageCurve: { wheelTravelMm: number; ratio: number }[] } };
    };
    expect(model.rearWheelTravelMm).toBe(300);
    expect(model.spec.rear.shockStrokeMm).toBe(Number(STROKE));
    expect(model.spec.rear.leverageCurve.map((p) => [p.wheelTravelMm, p.ratio])).toEqual(CURVE);
  });

  test("an invited tuner joins through the e-mailed link; deactivation signs them out at once", async ({
    page,
    mailbox,
    newVisitor,
  }) => {
    const email = `e2e-tuner-${uniqueStamp()}@example.test`;
    // A name of its own: another run's deactivated newcomer must not answer for this one.
    const newcomer = `Tess Newcomer${uniqueLetters()}`;
    await signInWithPassword(page, OWNER, "/shop/team");
    const invite = page.getByRole("form", { name: "Invite to the team" });
    await invite.getByLabel("E-mail").fill(email);
    await invite.getByRole("button", { name: "Send invitation" }).click();
    await expect(page.getByRole("status").first()).toContainText(`Invitation sent to ${email}`);

    // The outbox worker sends it just after the answer: wait for it to arrive.
    let messages: Awaited<ReturnType<typeof mailbox.for>> = [];
    await expect.poll(async () => (messages = await mailbox.for(email)).length).toBe(1);
    const link = /href="([^"]*\/invite\/[^"]+)"/.exec(messages[0]?.html ?? "")?.[1];
    expect(link, "the e-mail carries the invitation link").toBeTruthy();

    const tab = await (await newVisitor()).newPage();
    await tab.goto(link!);
    const accept = tab.getByRole("form", { name: "Accept invitation" });
    await accept.getByLabel("Your name").fill(newcomer);
    await accept.getByLabel("Password").fill("a-long-password-1");
    await accept.getByRole("button", { name: "Join the workspace" }).click();
    await expect(tab).toHaveURL("/shop");
    const nav = tab.getByRole("navigation", { name: "Workspace" });
    await expect(nav.getByRole("link", { name: "Catalog", exact: true })).toHaveCount(1);
    await expect(nav.getByRole("link", { name: "Team", exact: true })).toHaveCount(0);

    await page.reload();
    await page.getByRole("button", { name: `Deactivate ${newcomer}`, exact: true }).click();
    await expect(page.getByRole("button", { name: `Reactivate ${newcomer}`, exact: true })).toHaveCount(1);
    await tab.goto("/shop/catalog");
    await expect(tab).toHaveURL((url) => url.pathname === "/sign-in");
  });

  test("a bike the admin added is in the catalog list", async ({ page, staffApi }) => {
    const name = bikeName();
    await addProgressiveBike(await staffApi(OWNER), name);
    await signInWithPassword(page, OWNER, "/shop/catalog");
    await page.goto(`/shop/catalog?q=${encodeURIComponent(name)}`);
    await expect(page.getByRole("link", { name, exact: true })).toHaveCount(1);
  });

  test("a rider's request on a bike the admin added is sized on it", async ({ staffApi, submitRequest }) => {
    const name = bikeName();
    const owner = await staffApi(OWNER);
    const bikeId = await addProgressiveBike(owner, name);
    const email = `e2e-rider-${uniqueStamp()}@example.test`;
    const { id } = await submitRequest({
      rider: {
        name: "Test Rider",
        email,
        weight: { value: 80, unit: "kg" },
        gearIncluded: true,
        skill: "intermediate",
        style: "moderate",
      },
      riding: { discipline: "enduro", terrain: [], jumpSize: "medium" },
      bike: { modelId: bikeId },
      feel: { complaints: [] },
      review: { consent: true },
    });
    const queue = await owner.get(`/api/requests?q=${encodeURIComponent(email)}`);
    const items = ((await queue.json()) as { items: { id: string; bikeLabel: string }[] }).items;
    expect(items.map((i) => [i.id, i.bikeLabel])).toEqual([[id, name]]);
  });
});
