import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

// Imports run one way: app → components → lib services → db/queries → lib/sizing (pure). Each block
// below forbids, for one folder, the imports that would run the other way (README "Where things live").
const RULE = "@typescript-eslint/no-restricted-imports";

/** The workflow services: they call db/queries and send e-mail, so nothing below them imports them. */
const SERVICES = [
  "@/lib/review/workflow",
  "@/lib/review/save-recommendation",
  "@/lib/requests/intake",
  "@/lib/requests/sag-follow-up",
  "@/lib/auth/staff",
  "@/lib/notify",
  "@/lib/notify-staff",
  "@/lib/requests/rider-answer",
  "@/lib/service/due-soon",
  "@/lib/service/hours",
  "@/lib/service/overview",
  "@/lib/service/reminders",
  "@/lib/orders/service",
  "@/lib/orders/payments",
  "@/lib/orders/notify",
  "@/lib/orders/view",
];

const layer = (files, patterns, ignores = []) => ({ files, ignores, rules: { [RULE]: ["error", { patterns }] } });

const layers = [
  // The engine is pure: no app code, no framework, no database.
  layer(
    ["lib/sizing/**"],
    [
      {
        group: ["@/*", "!@/lib/sizing", "!@/lib/sizing/*"],
        message: "lib/sizing imports nothing of the app (see lib/sizing/README.md).",
      },
      {
        group: ["next", "next/*", "react", "react-dom", "drizzle-orm", "drizzle-orm/*"],
        message: "lib/sizing is pure TypeScript.",
      },
    ],
  ),
  // Data access: rows in, rows out; no HTTP errors, no e-mail, no services.
  layer(
    ["db/**"],
    [
      {
        group: ["@/lib/api", "@/lib/api/*"],
        message: "db never imports lib/api: return null/false and let the service decide.",
      },
      {
        group: ["@/lib/mail", "@/lib/mail/*", ...SERVICES],
        message: "db never imports services or e-mail: services call db/queries.",
      },
      { group: ["@/app/*", "@/components/*", "next", "next/*"], message: "db knows nothing of pages or Next." },
    ],
    // The seed scripts sit above everything: they create accounts and requests through the services.
    ["db/seed.ts", "db/seed-demo.ts", "db/seed-orders.ts"],
  ),
  // Shared schemas run in the browser too: no server modules.
  layer(
    ["lib/validations/**"],
    [
      {
        group: ["@/lib/api", "@/lib/api/*", "@/db/*", "@/lib/mail", "@/lib/mail/*", ...SERVICES],
        message: "lib/validations is shared with the browser: no database, API or service imports.",
      },
    ],
  ),
  // Other lib modules serve pages and routes, never the reverse.
  layer(
    ["lib/**"],
    [{ group: ["@/app/*", "@/components/*"], message: "lib never imports pages or components." }],
    ["lib/sizing/**", "lib/validations/**"],
  ),
  // Components get data from pages (props) or the API client; database types only.
  {
    files: ["components/**"],
    rules: {
      [RULE]: [
        "error",
        {
          patterns: [
            {
              group: ["@/db/*"],
              allowTypeImports: true,
              message: "Components never import db at run time: get rows from the page or the API.",
            },
            {
              group: ["@/app/*", "@/lib/api/*", ...SERVICES],
              message: "Components call services through the API client, never directly.",
            },
          ],
        },
      ],
    },
  },
];

const config = [
  ...nextVitals,
  ...nextTs,
  ...layers,
  { ignores: [".next/**", "node_modules/**", "data/**", "db/migrations/**", "next-env.d.ts"] },
];

export default config;
