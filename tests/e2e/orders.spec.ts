// After the sheet, in Chromium against the seeded production server and the payments fake: a rider
// of the test's own (approved request) asks for a quote on a phone, accepts it and pays on the
// fake's payment page; staff on a laptop move an order across the workshop board and mark a part out
// at a finisher. Prices come from the demo price list (db/seed-orders.ts); only what the app derives
// from them is checked.
import { stableUuid } from "@/db/seed-data";
import { e2eUrl } from "./support/env";
import { expect, signInWithPassword, test, uniqueStamp } from "./support/fixtures";
import { answersLike } from "./support/requests";

test.describe("rider, on a phone", () => {
  test.use({ viewport: { width: 390, height: 844 } });

  test("asks for a quote, accepts it and pays on the payment page", async ({ page, submitRequest, staffApi }) => {
    const stamp = uniqueStamp();
    const { id, statusUrl } = await submitRequest(
      answersLike("r09", { name: "Dario Orderly", email: `order.${stamp}@example.test` }),
    );
    const tuner = await staffApi("tuner@sagwise.test");
    expect((await tuner.post(`/api/requests/${id}/approve`, { data: {} })).ok()).toBe(true);

    await page.goto(statusUrl);
    const orders = page.getByRole("region", { name: "Order the work" });
    await orders.getByRole("radio", { name: /Springs only/ }).check();
    await orders.getByRole("button", { name: "Ask for a quote" }).click();

    const yourOrder = page.getByRole("region", { name: "Your order" });
    await expect(yourOrder.getByRole("heading", { name: /Order \d+ · Springs only/ })).toHaveCount(1);
    await expect(yourOrder.getByRole("cell", { name: /^Shock spring \d+\.\d\d N\/mm$/ })).toHaveCount(1);
    const total = (await yourOrder.getByTestId("order-total").textContent())!;
    expect(total).toMatch(/^€\d/);
    await yourOrder.getByRole("button", { name: `Accept the quote (${total})` }).click();
    await expect(yourOrder.getByText("Quote accepted. Payment: Not paid yet")).toHaveCount(1);

    await yourOrder.getByRole("button", { name: `Pay ${total}` }).click();
    await expect(page).toHaveURL(new RegExp(`^${e2eUrl("paymentsUrl").replace(/[.]/g, "\\.")}/pay/cs_test_`));
    await expect(page.getByText("no money moves")).toHaveCount(1);
    await page.getByRole("button", { name: `Pay ${total}` }).click();

    await expect(page).toHaveURL(/\/status\/.+\?payment=done$/);
    await expect(page.getByRole("status").filter({ hasText: "payment is being confirmed" })).toHaveCount(1);
    await expect(page.getByRole("region", { name: "Your order" }).getByText("Payment: Paid")).toHaveCount(1);
    const recorded = (await (await fetch(`${e2eUrl("paymentsUrl")}/payments`)).json()) as {
      sessions: { status: string; amount_total: number; metadata: { orderNumber: string } }[];
    };
    expect(recorded.sessions.filter((s) => s.status === "complete").length).toBeGreaterThan(0);
    const box = await page.evaluate(() => document.documentElement.scrollWidth);
    expect(box).toBeLessThanOrEqual(390);
  });
});

test.describe("staff, on a laptop", () => {
  test.use({ viewport: { width: 1440, height: 900 } });

  test("moves an order across the board and marks a part out at a finisher", async ({
    page,
    submitRequest,
    staffApi,
  }) => {
    const stamp = uniqueStamp();
    const { id } = await submitRequest(
      answersLike("r10", { name: "Ines Boardwalk", email: `board.${stamp}@example.test` }),
    );
    const tuner = await staffApi("tuner@sagwise.test");
    expect((await tuner.post(`/api/requests/${id}/approve`, { data: {} })).ok()).toBe(true);
    const created = await tuner.post(`/api/requests/${id}/order`, { data: { serviceType: "kit" } });
    expect(created.status()).toBe(201);
    const { id: orderId } = (await created.json()) as { id: string };
    expect((await tuner.post(`/api/orders/${orderId}/accept`, { data: {} })).ok()).toBe(true);
    const { number } = (await (await tuner.get(`/api/orders/${orderId}`)).json()) as { number: number };

    await signInWithPassword(page, "tuner@sagwise.test", "/shop/workshop");
    const board = page.getByRole("region", { name: "Workshop board" });
    const column = (name: string) => board.getByRole("region", { name: new RegExp(`^${name} \\(`) });
    const card = (name: string) => column(name).getByRole("listitem", { name: `Order ${number}`, exact: true });

    await expect(card("Waiting for parts")).toHaveCount(1);
    await card("Waiting for parts")
      .getByRole("button", { name: `Move order ${number} to On the bench` })
      .click();
    await expect(card("On the bench")).toHaveCount(1);
    await expect(card("Waiting for parts")).toHaveCount(0);

    await card("On the bench")
      .getByRole("link", { name: `Order ${number}: Out at a finisher (details on the order page)` })
      .click();
    await expect(page).toHaveURL(`/shop/workshop/${orderId}#finisher`);
    const form = page.getByRole("form", { name: "Send a part out" });
    await form.getByRole("button", { name: "Mark part out" }).click();
    await expect(form.getByText("Enter the part")).toHaveCount(1);
    await form.getByLabel("Part").fill("Shock spring (polish)");
    await form.getByLabel("Finisher").selectOption(stableUuid("finisher:polish")); // db/seed-orders.ts
    await form.getByRole("button", { name: "Mark part out" }).click();
    await expect(page.getByText(/^Stage: Out at a finisher · Payment/)).toHaveCount(1);
    await expect(page.getByRole("button", { name: "Mark Shock spring (polish) back" })).toHaveCount(1);

    await page.goto("/shop/workshop");
    await expect(card("Out at a finisher")).toContainText("1 part out, back by");
  });
});
