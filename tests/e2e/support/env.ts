// What global setup hands the tests: the servers' URLs (through the environment) and the auth secret
// the seeded server runs with (the demo requests' status tokens are derived from it).

/** Only for the throwaway server of a browser-test run. */
export const E2E_AUTH_SECRET = "e2e-secret-e2e-secret-e2e-secret-0123456789";

export const E2E_ENV = {
  baseUrl: "SAGWISE_E2E_BASE_URL",
  mailUrl: "SAGWISE_E2E_MAIL_URL",
  paymentsUrl: "SAGWISE_E2E_PAYMENTS_URL",
} as const;

export const DEMO_PASSWORD = process.env.DEMO_PASSWORD ?? "sagwise-demo";

export function e2eUrl(which: keyof typeof E2E_ENV): string {
  const url = process.env[E2E_ENV[which]];
  if (!url) throw new Error(`${E2E_ENV[which]} is not set: run the browser tests with \`npm run test:e2e\`.`);
  return url;
}
