// `npm run db:backup -- FILE`: the database and the uploads in one tar.gz (see lib/backup).
import { backupTo } from "@/lib/backup";

const file = process.argv.slice(2).find((a) => !a.startsWith("--"));
if (!file) {
  console.error("Usage: npm run db:backup -- FILE   (for example backups/sagwise-2026-06-01.tar.gz)");
  process.exit(2);
}
backupTo(file)
  .then((m) =>
    console.log(
      `[sagwise] backup written to ${file}: ${m.kind} database${m.migration ? ` at ${m.migration}` : ""}, ${m.uploads} upload(s)`,
    ),
  )
  .catch((error: unknown) => {
    console.error(`[sagwise] ${(error as Error).message}`);
    process.exit(1);
  });
