// Server-rendered pages of the outbox viewer. Everything that came from a message is escaped;
// the message's own html only ever goes into a sandboxed iframe's srcdoc (no scripts, no same-origin).
import type { StoredEmail } from "./store";

export function escapeHtml(value: string): string {
  return value
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&#39;");
}

const e = escapeHtml;

const CSS = `
*{box-sizing:border-box}body{margin:0;font:15px/1.5 system-ui,-apple-system,"Segoe UI",sans-serif;color:#1d2327;background:#eef0ea}
header{background:#22302a;color:#f3f5ef;padding:12px 20px;display:flex;gap:12px;align-items:baseline;flex-wrap:wrap}
header a{color:inherit;text-decoration:none;font-weight:700;letter-spacing:.02em}header span{opacity:.7;font-size:13px}
main{max-width:980px;margin:0 auto;padding:16px}
.card{background:#fff;border:1px solid #d5d9cf;border-radius:8px;padding:14px 16px;margin-bottom:14px}
h1{font-size:20px;margin:0 0 4px}h2{font-size:14px;text-transform:uppercase;letter-spacing:.06em;color:#5b665f;margin:0 0 8px}
form{display:flex;gap:8px;flex-wrap:wrap;align-items:center}input{font:inherit;padding:5px 8px;border:1px solid #b9c0b3;border-radius:5px;min-width:240px}
button{font:inherit;padding:5px 12px;border-radius:5px;border:1px solid #22302a;background:#22302a;color:#fff;cursor:pointer}
ul.list{list-style:none;margin:0;padding:0}ul.list li{border-top:1px solid #e4e7df}ul.list li:first-child{border-top:0}
ul.list a{display:grid;grid-template-columns:1fr auto;gap:2px 12px;padding:10px 4px;color:inherit;text-decoration:none}
ul.list a:hover{background:#f6f7f3}.subj{font-weight:600}.meta{color:#5b665f;font-size:13px}.when{color:#5b665f;font-size:13px;text-align:right}
dl{display:grid;grid-template-columns:max-content 1fr;gap:2px 14px;margin:0}dt{color:#5b665f}dd{margin:0;word-break:break-word}
.frame{border:1px solid #d5d9cf;border-radius:6px;background:#fff;width:100%;height:640px;display:block;margin:0 auto}
.frame.phone{width:390px;max-width:100%}
.tabs a{margin-right:10px;font-size:13px}.tabs a.on{font-weight:700;color:#1d2327;text-decoration:none}
pre{white-space:pre-wrap;word-break:break-word;margin:0;font:13px/1.5 ui-monospace,Menlo,Consolas,monospace}
.empty{color:#5b665f;padding:20px 4px}a{color:#1f5c8a}.badge{display:inline-block;font-size:12px;background:#e3e8dc;border-radius:10px;padding:0 7px;margin-left:6px}
`;

function page(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1">
<title>${e(title)}</title><style>${CSS}</style></head><body>
<header><a href="/">Sagwise outbox viewer</a><span>local mail fake, development only: nothing here left this machine</span></header>
<main>${body}</main></body></html>`;
}

export function inboxPage(emails: StoredEmail[], filterTo: string | undefined): string {
  const rows = emails
    .map((m) => {
      const files = m.attachments.length
        ? `<span class="badge">${m.attachments.length} attachment${m.attachments.length > 1 ? "s" : ""}</span>`
        : "";
      return `<li><a href="/inbox/${e(m.id)}"><span class="subj">${e(m.subject)}${files}</span>
<span class="when">${e(m.created_at.replace("T", " ").slice(0, 19))} UTC</span>
<span class="meta">to ${e(m.to.join(", "))}</span><span class="meta">${e(m.from)}</span></a></li>`;
    })
    .join("");
  const body = `<div class="card"><h1>Outbox</h1>
<p class="meta">${emails.length} message${emails.length === 1 ? "" : "s"}${filterTo ? ` to ${e(filterTo)}` : ""}, newest first. JSON: <a href="/emails">/emails</a></p>
<form method="get" action="/"><input type="email" name="to" placeholder="Filter by recipient" value="${e(filterTo ?? "")}" aria-label="Recipient">
<button type="submit">Filter</button>${filterTo ? ' <a href="/">Show all</a>' : ""}</form></div>
<div class="card">${rows ? `<ul class="list">${rows}</ul>` : '<p class="empty">No messages yet. Anything the app sends through the resend SDK to this service shows up here.</p>'}</div>`;
  return page("Outbox · Sagwise", body);
}

/** http(s) links in the message, so a developer can follow a sign-in link without the iframe. */
export function extractLinks(html: string): string[] {
  const decode = (s: string) =>
    s
      .replace(/&quot;/g, '"')
      .replace(/&#x27;|&#39;/g, "'")
      .replace(/&lt;/g, "<")
      .replace(/&gt;/g, ">")
      .replace(/&amp;/g, "&");
  const links = new Set<string>();
  for (const match of html.matchAll(/href\s*=\s*"([^"]*)"/gi)) {
    const url = decode(match[1] ?? "").trim();
    if (/^https?:\/\//i.test(url)) links.add(url);
  }
  return [...links];
}

export function messagePage(m: StoredEmail, width: "phone" | "wide"): string {
  const field = (label: string, value: string | null | undefined) =>
    value ? `<dt>${e(label)}</dt><dd>${e(value)}</dd>` : "";
  const headerRows = [
    field("From", m.from),
    field("To", m.to.join(", ")),
    field("Cc", m.cc?.join(", ")),
    field("Bcc", m.bcc?.join(", ")),
    field("Reply-To", m.reply_to?.join(", ")),
    field("Subject", m.subject),
    field("Date", m.created_at),
    field("Message id", m.id),
    field("Tags", m.tags?.map((t) => `${t.name}=${t.value}`).join(", ")),
    ...Object.entries(m.headers ?? {}).map(([k, v]) => field(k, v)),
  ].join("");
  const tab = (w: "phone" | "wide", label: string) =>
    `<a href="/inbox/${e(m.id)}?width=${w}"${w === width ? ' class="on"' : ""}>${label}</a>`;
  const html = m.html
    ? `<div class="tabs">${tab("phone", "Phone width")}${tab("wide", "Full width")}</div>
<iframe class="frame ${width === "phone" ? "phone" : ""}" title="HTML part of the message" sandbox="allow-popups allow-popups-to-escape-sandbox" referrerpolicy="no-referrer" srcdoc="${e(m.html)}"></iframe>`
    : '<p class="empty">No HTML part.</p>';
  const links = m.html ? extractLinks(m.html) : [];
  const attachments = m.attachments
    .map((a, i) =>
      a.content !== null
        ? `<li><a href="/inbox/${e(m.id)}/attachments/${i}">${e(a.filename ?? `attachment-${i}`)}</a> <span class="meta">${e(a.content_type ?? "type from file name")}, ${a.size} bytes</span></li>`
        : `<li>${e(a.filename ?? "remote file")} <span class="meta">remote: ${e(a.path ?? "")}</span></li>`,
    )
    .join("");
  const body = `<p><a href="/">← Outbox</a> · <a href="/emails/${e(m.id)}">JSON</a></p>
<div class="card"><h1>${e(m.subject)}</h1><dl>${headerRows}</dl></div>
<div class="card"><h2>As the rider sees it</h2>${html}</div>
${links.length ? `<div class="card"><h2>Links in the message</h2><ul>${links.map((l) => `<li><a href="${e(l)}" rel="noreferrer noopener" target="_blank">${e(l)}</a></li>`).join("")}</ul></div>` : ""}
<div class="card"><h2>Plain-text part</h2>${m.text ? `<pre>${e(m.text)}</pre>` : '<p class="empty">No plain-text part.</p>'}</div>
${attachments ? `<div class="card"><h2>Attachments</h2><ul>${attachments}</ul></div>` : ""}`;
  return page(`${m.subject} · Sagwise outbox`, body);
}

export function notFoundPage(): string {
  return page(
    "Not found · Sagwise outbox",
    '<div class="card"><h1>No such message</h1><p><a href="/">Back to the outbox</a></p></div>',
  );
}
