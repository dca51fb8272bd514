// The service reminder e-mail on a phone: rendered by Chromium (Debian's, through playwright-core)
// in a 320 px wide viewport — the narrowest common phone width, CSS px, of the original iPhone SE
// class — and nothing may be wider than the screen (no sideways scrolling), with the long private
// link wrapped. It names each service with its date and carries the booking link with the bike.
import { chromium, type Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { demoProps } from "@/emails/service-reminder";
import { renderTemplate } from "@/lib/mail";

let browser: Browser;
beforeAll(async () => {
  browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    args: ["--no-sandbox", "--disable-gpu", "--no-first-run", "--disable-background-networking"],
  });
}, 60_000);
afterAll(async () => {
  await browser?.close();
});

const long = {
  ...demoProps,
  bikeLabel: "Generic 450 four-stroke motocrosser with a long name typed by the rider",
  url: `https://demo.sagwise.test/request?bike=${"0".repeat(8)}-0000-4000-8000-${"0".repeat(12)}`,
  statusUrl: `https://demo.sagwise.test/status/${"x".repeat(64)}`,
};

describe("service reminder e-mail", () => {
  it("fits a 320 px wide screen", async () => {
    const { html } = await renderTemplate("service-reminder", long);
    const page = await browser.newPage({ viewport: { width: 320, height: 640 } });
    try {
      await page.setContent(html, { waitUntil: "load" });
      const widths = await page.evaluate(() => ({
        document: document.documentElement.scrollWidth,
        widest: Math.max(...[...document.querySelectorAll("body *")].map((e) => e.getBoundingClientRect().right)),
      }));
      expect(widths.document).toBeLessThanOrEqual(320);
      expect(widths.widest).toBeLessThanOrEqual(320);
      // The button is on screen and leads to the booking link.
      const button = page.getByRole("link", { name: "Book it: start a request for this bike" });
      expect(await button.getAttribute("href")).toBe(long.url);
      expect((await button.boundingBox())!.width).toBeLessThanOrEqual(320);
    } finally {
      await page.close();
    }
  });

  it("names each service with its day, overdue ones as overdue", async () => {
    const { text, subject } = await renderTemplate("service-reminder", demoProps);
    expect(subject).toBe(`2 services due for your ${demoProps.bikeLabel}`);
    expect(text).toContain("Fork oil change");
    expect(text).toContain("due 14 Dec 2026");
    expect(text).toContain("overdue since 28 Nov 2026");
    expect(text).toContain(demoProps.url);
    expect(text).toMatch(/service manual comes first/);
    const one = await renderTemplate("service-reminder", { ...demoProps, services: demoProps.services.slice(0, 1) });
    expect(one.subject).toBe(`Fork oil change due for your ${demoProps.bikeLabel}`);
  });
});
