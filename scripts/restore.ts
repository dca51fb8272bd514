// `npm run db:restore -- FILE [--force]`: puts a backup from db:backup back (see lib/backup). Refuses
// to replace a database or uploads that hold anything unless --force.
import { restoreFrom } from "@/lib/backup";

const args = process.argv.slice(2);
const file = args.find((a) => !a.startsWith("--"));
if (!file) {
  console.error("Usage: npm run db:restore -- FILE [--force]");
  process.exit(2);
}
restoreFrom(file, { force: args.includes("--force") })
  .then((m) =>
    console.log(`[sagwise] restored ${file} (${m.kind} database from ${m.createdAt}, ${m.uploads} upload(s))`),
  )
  .catch((error: unknown) => {
    console.error(`[sagwise] ${(error as Error).message}`);
    process.exit(1);
  });
