// Every template in emails/ renders to an html and a plain-text part that both carry the link,
// escapes what it is given, and fetches nothing when opened (no images, no web fonts, no scripts).
import { describe, expect, it } from "vitest";
import { emailTemplateNames, emailTemplates } from "@/emails";
import { renderTemplate } from "@/lib/mail";

/** The link the template's button leads to. */
function primaryLink(demo: object): string {
  const props = demo as { url?: string; sheetUrl?: string; statusUrl?: string };
  const link = props.url ?? props.sheetUrl ?? props.statusUrl;
  if (!link) throw new Error("template demo props carry no link");
  return link;
}

describe.each(emailTemplateNames)("template %s", (name) => {
  const demo = emailTemplates[name].demoProps;
  const link = primaryLink(demo);

  it("puts the link in the button and in the plain text, with the shop's name", async () => {
    const { subject, html, text } = await renderTemplate(name, demo as never);
    expect(html).toContain(`href="${link.replaceAll("&", "&amp;")}"`);
    expect(text).toContain(link);
    expect(html).toContain(demo.shopName);
    expect(text).toContain(demo.shopName);
    expect(subject.length).toBeGreaterThan(10);
    expect(subject).not.toMatch(/[\r\n]/);
  });

  it("loads nothing from outside and runs no script", async () => {
    const { html } = await renderTemplate(name, demo as never);
    expect(html).not.toMatch(/<img|<link|<script|@import|url\(/i);
  });

  it("is one XHTML 1.0 Transitional document with no hydration comments", async () => {
    // The doctype is W3C's for XHTML 1.0 Transitional (https://www.w3.org/TR/xhtml1/#dtds), the one
    // react-email writes. The only comments are Outlook's conditional ones (`<!--[if mso]>…<![endif]-->`,
    // Microsoft's syntax for its Word-based renderer); React's hydration markers (`<!-- -->`,
    // `<!--$-->`) mean nothing in a mail.
    const { html } = await renderTemplate(name, demo as never);
    expect(html.startsWith('<!DOCTYPE html PUBLIC "-//W3C//DTD XHTML 1.0 Transitional//EN"')).toBe(true);
    expect(html.match(/<!DOCTYPE/gi)).toHaveLength(1);
    const comments = html.match(/<!--[\s\S]*?-->/g) ?? [];
    expect(comments.filter((c) => !c.startsWith("<!--[if mso]>"))).toEqual([]);
    expect(html.trimEnd().endsWith("</html>")).toBe(true);
  });

  it("escapes the shop's name", async () => {
    const { html, subject } = await renderTemplate(name, { ...demo, shopName: 'Ride <b>"Fast"</b>' } as never);
    expect(html).not.toContain("<b>");
    expect(html).toContain("Ride &lt;b&gt;&quot;Fast&quot;&lt;/b&gt;");
    // The subject is a plain-text header: never HTML-escaped.
    expect(subject).not.toContain("&lt;");
  });
});

describe("template wording", () => {
  it("sign-in link states how long the link works", async () => {
    const one = await renderTemplate("sign-in-link", {
      url: "https://demo.sagwise.test/s",
      expiresInMinutes: 1,
      shopName: "Shop",
    });
    expect(one.text).toContain("stops working after 1 minute.");
    const many = await renderTemplate("sign-in-link", {
      url: "https://demo.sagwise.test/s",
      expiresInMinutes: 30,
      shopName: "Shop",
    });
    expect(many.text).toContain("stops working after 30 minutes.");
  });

  it("staff invite names the inviter and the role", async () => {
    const admin = await renderTemplate("staff-invite", {
      url: "https://demo.sagwise.test/i",
      role: "admin",
      inviterName: "Alex Demo",
      shopName: "Shop",
    });
    expect(admin.subject).toBe("Alex Demo invited you to the Shop workspace");
    expect(admin.text).toContain("As an admin you can");
    const tuner = await renderTemplate("staff-invite", {
      url: "https://demo.sagwise.test/i",
      role: "tuner",
      inviterName: "Alex Demo",
      shopName: "Shop",
    });
    expect(tuner.text).toContain("As a tuner you can");
  });
});
