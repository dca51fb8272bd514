// The app's browser security headers, in one place (used by next.config.ts and proxy.ts).
// Directives: W3C Content Security Policy Level 3; Referrer-Policy: W3C Referrer Policy;
// Permissions-Policy: W3C Permissions Policy. The status page's address carries the rider's private
// token, so the Referer never leaves the site ("same-origin").

/** Scripts only with this response's nonce (and what they load: 'strict-dynamic'); styles from the
 * site plus inline style attributes, which React and next/font write; nothing may frame a page. */
export function contentSecurityPolicy(nonce: string, development = false): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${development ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

/** For every response, pages and API alike. */
export const STATIC_SECURITY_HEADERS: { key: string; value: string }[] = [
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "same-origin" },
  // Older browsers without frame-ancestors.
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=(), payment=(), usb=()" },
  { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
];
