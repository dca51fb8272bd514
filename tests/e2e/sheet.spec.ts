// The setup sheet from the production build (`next start`), as the rider's e-mail link and a tuner
// open it: fonts shipped with the app are found and embedded; and the staff e-mail previews. Both
// only read the seeded, approved r10.
import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import AxeBuilder from "@axe-core/playwright";
import { stableUuid } from "@/db/seed-data";
import { demoStatusToken } from "@/lib/requests/token";
import { E2E_AUTH_SECRET } from "./support/env";
import { expect, signInWithPassword, test } from "./support/fixtures";

const r10 = stableUuid("request:r10");

function poppler(tool: "pdftotext" | "pdffonts", pdf: Uint8Array): string {
  const dir = mkdtempSync(path.join(os.tmpdir(), "sagwise-e2e-pdf-"));
  try {
    writeFileSync(path.join(dir, "sheet.pdf"), pdf);
    const args = tool === "pdftotext" ? ["-layout", path.join(dir, "sheet.pdf"), "-"] : [path.join(dir, "sheet.pdf")];
    return execFileSync(tool, args, { encoding: "utf8" });
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

test.describe("setup sheet download", () => {
  test("opens for the rider's private link, with the shop's fonts embedded", async ({ request }) => {
    const response = await request.get(
      `/api/requests/${r10}/sheet?version=1&token=${demoStatusToken(E2E_AUTH_SECRET, r10)}`,
    );
    expect(response.status()).toBe(200);
    expect(response.headers()["content-type"]).toBe("application/pdf");
    expect(response.headers()["content-disposition"]).toMatch(/^inline; filename="setup-sheet-\d+-v1\.pdf"$/);
    const pdf = new Uint8Array(await response.body());
    const text = poppler("pdftotext", pdf);
    expect(text).toContain("Cinderline Suspension (demo)");
    expect(text).toContain("Hana Whitlock");
    expect(text).toContain("store energy");
    // Every font in the file is Inter, embedded as a subset: nothing falls back to a viewer's font.
    const fonts = poppler("pdffonts", pdf)
      .split("\n")
      .slice(2)
      .filter((l) => l.trim());
    expect(fonts.length).toBeGreaterThan(0);
    for (const line of fonts) {
      expect(line).toMatch(/^[A-Z]{6}\+Inter/);
      expect(line).toMatch(/\byes\s+yes\s+(yes|no)\s+\d+\s+0\s*$/); // emb, sub, uni, object, generation
    }
  });

  test("refuses an anonymous visitor without a link", async ({ request }) => {
    const response = await request.get(`/api/requests/${r10}/sheet?version=1`);
    expect(response.status()).toBe(401);
  });
});

test.describe("e-mail previews", () => {
  test("a tuner finds every e-mail from the nav, with its html and plain text", async ({ page }) => {
    await signInWithPassword(page, "tuner@sagwise.test", "/shop");

    await page.getByRole("link", { name: "E-mails" }).click();
    await expect(page).toHaveURL("/shop/emails");
    await expect(page.getByRole("heading", { level: 1 })).toHaveText("E-mails");
    // One heading per template of the registry (emails/index.ts), order e-mails included.
    await expect(page.getByRole("heading", { level: 2 })).toHaveCount(10);

    const frame = page.frameLocator(
      'iframe[title="Approved (or revised) setup sheet with its download link: html preview"]',
    );
    await expect(frame.getByRole("link", { name: /Download the setup sheet/ })).toHaveCount(1);

    const sheet = page
      .getByRole("listitem")
      .filter({ has: page.getByRole("heading", { name: /setup sheet with its download link/ }) });
    await sheet.getByText("Plain-text part").click();
    await expect(sheet.locator("pre")).toContainText("Download the setup sheet (version 1)");

    const axe = await new AxeBuilder({ page }).exclude("iframe").withTags(["wcag2a", "wcag2aa"]).analyze();
    expect(axe.violations.map((v) => `${v.id}: ${v.help}`)).toEqual([]);
  });
});
