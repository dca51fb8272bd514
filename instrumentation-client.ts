// Runs in the browser before the app's own code (Next.js instrumentation-client convention).
// zod compiles object schemas with `new Function` when it may; the pages' Content-Security-Policy
// forbids eval (proxy.ts), so zod's probe would be reported as a violation on every form page.
// Its interpreted mode gives the same results.
import { z } from "zod";

z.config({ jitless: true });
