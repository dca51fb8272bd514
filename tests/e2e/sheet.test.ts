// The setup sheet from the production build (`next start`), as the rider's e-mail link and a tuner
// open it: fonts shipped with the app are found and embedded; and the staff e-mail previews.
import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import AxeBuilder from "@axe-core/playwright";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { stableUuid } from "@/db/seed-demo";
import { demoStatusToken } from "@/lib/requests/token";
import { openBrowser, type Browsing } from "./browser";

const baseUrl = inject("baseUrl");
const SECRET = "e2e-secret-e2e-secret-e2e-secret-0123456789"; // tests/e2e/setup.ts
const DEMO_PASSWORD = process.env.DEMO_PASSWORD ?? "sagwise-demo";
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

describe("setup sheet download", () => {
  it("opens for the rider's private link, with the shop's fonts embedded", async () => {
    const response = await fetch(`${baseUrl}/api/requests/${r10}/sheet?version=1&token=${demoStatusToken(SECRET, r10)}`);
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("application/pdf");
    expect(response.headers.get("content-disposition")).toMatch(/^inline; filename="setup-sheet-\d+-v1\.pdf"$/);
    const pdf = new Uint8Array(await response.arrayBuffer());
    const text = poppler("pdftotext", pdf);
    expect(text).toContain("Cinderline Suspension (demo)");
    expect(text).toContain("Hana Whitlock");
    expect(text).toContain("store energy");
    // Every font in the file is Inter, embedded as a subset: nothing falls back to a viewer's font.
    const fonts = poppler("pdffonts", pdf).split("\n").slice(2).filter((l) => l.trim());
    expect(fonts.length).toBeGreaterThan(0);
    for (const line of fonts) {
      expect(line).toMatch(/^[A-Z]{6}\+Inter/);
      expect(line).toMatch(/\byes\s+yes\s+(yes|no)\s+\d+\s+0\s*$/); // emb, sub, uni, object, generation
    }
  });

  it("refuses an anonymous visitor without a link", async () => {
    const response = await fetch(`${baseUrl}/api/requests/${r10}/sheet?version=1`);
    expect(response.status).toBe(401);
  });
});

describe("e-mail previews", () => {
  let browsing: Browsing;
  beforeAll(async () => {
    browsing = await openBrowser();
  });
  afterAll(() => browsing.close());

  it("a tuner finds every e-mail from the nav, with its html and plain text", async () => {
    const page = await browsing.context.newPage();
    await page.goto(`${baseUrl}/sign-in?next=/shop`);
    const staff = page.getByRole("form", { name: "Staff sign-in" });
    await staff.getByLabel("E-mail").fill("tuner@sagwise.test");
    await staff.getByLabel("Password").fill(DEMO_PASSWORD);
    await staff.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(`${baseUrl}/shop`);

    await page.getByRole("link", { name: "E-mails" }).click();
    await page.waitForURL(`${baseUrl}/shop/emails`);
    await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent()).toBe("E-mails");
    expect(await page.getByRole("heading", { level: 2 }).count()).toBe(6);

    const frame = page.frameLocator('iframe[title="Approved (or revised) setup sheet with its download link: html preview"]');
    await expect.poll(() => frame.getByRole("link", { name: /Download the setup sheet/ }).count()).toBe(1);

    const sheet = page.getByRole("listitem").filter({ has: page.getByRole("heading", { name: /setup sheet with its download link/ }) });
    await sheet.getByText("Plain-text part").click();
    await expect.poll(() => sheet.locator("pre").textContent()).toContain("Download the setup sheet (version 1)");

    const axe = await new AxeBuilder({ page }).exclude("iframe").withTags(["wcag2a", "wcag2aa"]).analyze();
    expect(axe.violations.map((v) => `${v.id}: ${v.help}`)).toEqual([]);
    await page.close();
  });
});
