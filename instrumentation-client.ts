// Runs in the browser before the app's own code (Next.js instrumentation-client convention).
// zod compiles object schemas with `new Function` when it may; the pages' Content-Security-Policy
// forbids eval (proxy.ts), so zod's probe would be reported as a violation on every form page.
// Its interpreted mode gives the same results. Only zod's core `config` is imported (the setting is
// global, shared with the schemas the form pages load), so a page without a form loads no zod.
import { config } from "zod/v4/core";

config({ jitless: true });
