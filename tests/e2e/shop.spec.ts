// A tuner's day in the workspace, in Chromium against the seeded production server: a rider of the
// test's own sends the answers of the seeded r04 (a 450 motocross bike, expert, supercross); the
// tuner finds the request by search, changes the shock spring and the fork oil level, watches the
// predicted sag follow, approves, and the rider's e-mail with the sheet link is in the mail fake.
import { expect, signInWithPassword, test, uniqueLetters } from "./support/fixtures";
import { answersLike } from "./support/requests";

const sagNumbers = (text: string | null) => (text?.match(/\d+\.\d/g) ?? []).map(Number);

test("search → adjust with live recompute → approve → rider e-mailed the sheet link", async ({
  page,
  mailbox,
  submitRequest,
}) => {
  // A surname no seeded or earlier rider has, so the search finds this one request.
  const name = `Quillane${uniqueLetters()}`;
  const rider = { name: `Priya ${name}`, email: `${name.toLowerCase()}@example.test` };
  const { id: requestId } = await submitRequest(answersLike("r04", rider));

  await signInWithPassword(page, "tuner@sagwise.test", "/shop");

  // Search narrows the queue (server-side) to the one rider.
  await page.getByLabel("Search rider, e-mail, bike or number").fill(name.toLowerCase());
  await expect(page).toHaveURL(new RegExp(`q=${name.toLowerCase()}`));
  await expect(page.getByText(/^1–1 of 1 requests/)).toHaveCount(1, { timeout: 15_000 });
  await page.getByRole("link", { name: rider.name, exact: true }).click();
  await expect(page).toHaveURL(`/shop/requests/${requestId}`);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText(new RegExp(`^Request \\d+: ${rider.name}$`));

  const predicted = page.getByRole("status", { name: "Predicted sag" });
  await expect(predicted).toHaveText(/(\d+\.\d.*){4}/);
  const before = sagNumbers(await predicted.textContent());
  expect(before).toHaveLength(4);

  // Shock: the stiffest spring on the shelf instead of the engine's pick.
  const stock = page.getByLabel("Shock spring rate from stock");
  const options = await stock
    .locator("option")
    .evaluateAll((os) => os.map((o) => (o as HTMLOptionElement).value).filter(Boolean));
  await stock.selectOption(options.at(-1)!);
  await expect
    .poll(async () => Number(await page.getByLabel("Shock spring rate", { exact: true }).inputValue()))
    .toBeCloseTo(Number(options.at(-1)), 1);
  // The engine re-solves preload to hold the race sag target, so with Hooke's law F = k(p + x) at
  // both sags, race − static = ΔW/k: a stiffer spring leaves MORE static sag (the classic sign of a
  // spring too stiff: common practice, follows from the force law).
  await expect.poll(async () => sagNumbers(await predicted.textContent())[1]!).toBeGreaterThan(before[1]! + 1);

  // Fork: 10 mm lower oil level (more air gap) → less force at full travel (Boyle's law).
  const oil = page.getByLabel("Fork oil level (mm from top)");
  const engineOil = Number(await oil.getAttribute("placeholder"));
  expect(engineOil).toBeGreaterThan(0);
  await oil.fill(String(engineOil + 10));
  const bottoming = page.getByRole("row", { name: /Fork force at full travel/ });
  await expect(bottoming).toHaveText(/changed \(-\d+\)/);

  await page.getByRole("button", { name: /Save and approve/ }).click();
  // Approving asks first, showing what the rider will be e-mailed.
  const confirm = page.getByRole("alertdialog", { name: /Approve version 1 and e-mail the rider/ });
  await expect(confirm).toContainText(rider.email);
  await expect(confirm).toContainText("is ready");
  await confirm.getByRole("button", { name: `Approve and e-mail ${rider.name}` }).click();
  await expect(page.getByRole("status").filter({ hasText: "approved" }).first()).toContainText(
    "Version 1 approved. The rider is being e-mailed the sheet link (see E-mails below).",
    { timeout: 20_000 },
  );
  await expect(page.locator("header").getByText("Approved", { exact: true })).toHaveCount(1);
  await expect(page.getByRole("link", { name: "Version 1: Approved" })).toHaveCount(1);

  // The audit timeline shows the override with old and new values.
  const history = page.getByRole("region", { name: "History" });
  await expect(history).toContainText(`Fork oil level (mm): engine's choice → ${engineOil + 10}`);

  let sheetMail: { subject: string; text?: string; html?: string } | undefined;
  await expect
    .poll(
      async () =>
        (sheetMail = (await mailbox.for(rider.email)).find((m) =>
          /Your setup sheet for request \d+ is ready/.test(m.subject),
        )),
      {
        timeout: 20_000,
      },
    )
    .toBeTruthy();
  expect(`${sheetMail!.text}${sheetMail!.html}`).toMatch(
    new RegExp(`/api/requests/${requestId}/sheet\\?version=1&(amp;)?token=[A-Za-z0-9_-]{20,}`),
  );
});
