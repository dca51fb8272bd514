// Messages on disk, one JSON file each, so the outbox survives restarts and tests can read it back.
// Field names follow the resend API's e-mail object (GET /emails/:id), plus what the fake keeps extra.
import { randomUUID } from "node:crypto";
import { mkdirSync, readdirSync, readFileSync, renameSync, rmSync, writeFileSync } from "node:fs";
import path from "node:path";

export interface StoredAttachment {
  filename: string | null;
  content_type: string | null;
  content_id: string | null;
  /** Remote attachment: the real API fetches it; the fake only records the address. */
  path: string | null;
  size: number;
  /** base64, as the SDK sent it. */
  content: string | null;
}

export interface StoredEmail {
  object: "email";
  id: string;
  created_at: string;
  from: string;
  to: string[];
  cc: string[] | null;
  bcc: string[] | null;
  reply_to: string[] | null;
  subject: string;
  html: string | null;
  text: string | null;
  headers: Record<string, string> | null;
  tags: { name: string; value: string }[] | null;
  attachments: StoredAttachment[];
  scheduled_at: string | null;
  last_event: "delivered";
  idempotency_key: string | null;
}

export type NewEmail = Omit<StoredEmail, "object" | "id" | "created_at" | "last_event">;

export interface MailStore {
  dir: string;
  add(email: NewEmail): StoredEmail;
  list(filter?: { to?: string }): StoredEmail[];
  get(id: string): StoredEmail | undefined;
  findByIdempotencyKey(key: string): StoredEmail | undefined;
  clear(): number;
}

const ID_PATTERN = /^[0-9a-f-]{36}$/;

/** "Rider Name <rider@x.test>" → "rider@x.test", lower-cased for matching. */
export function bareAddress(address: string): string {
  const match = /<([^<>]+)>\s*$/.exec(address);
  return (match?.[1] ?? address).trim().toLowerCase();
}

export function createMailStore(dir: string): MailStore {
  mkdirSync(dir, { recursive: true });

  const readAll = (): StoredEmail[] => {
    const emails: StoredEmail[] = [];
    for (const name of readdirSync(dir)) {
      if (!name.endsWith(".json")) continue;
      try {
        emails.push(JSON.parse(readFileSync(path.join(dir, name), "utf8")) as StoredEmail);
      } catch {
        // A half-written or hand-edited file must not take the whole outbox down.
      }
    }
    return emails.sort((a, b) => b.created_at.localeCompare(a.created_at));
  };

  // created_at strictly increases (even within one millisecond and across restarts), so
  // "newest first" is a total order.
  let lastMs = readAll().reduce((max, e) => Math.max(max, Date.parse(e.created_at)), 0);

  return {
    dir,
    add(email) {
      lastMs = Math.max(Date.now(), lastMs + 1);
      const stored: StoredEmail = {
        object: "email",
        id: randomUUID(),
        created_at: new Date(lastMs).toISOString(),
        last_event: "delivered",
        ...email,
      };
      const file = path.join(dir, `${stored.id}.json`);
      // Write then rename: a crash never leaves a truncated message behind.
      writeFileSync(`${file}.tmp`, JSON.stringify(stored, null, 2));
      renameSync(`${file}.tmp`, file);
      return stored;
    },
    list(filter = {}) {
      const all = readAll();
      if (!filter.to) return all;
      const wanted = bareAddress(filter.to);
      return all.filter((e) => e.to.some((t) => bareAddress(t) === wanted));
    },
    get(id) {
      if (!ID_PATTERN.test(id)) return undefined;
      try {
        return JSON.parse(readFileSync(path.join(dir, `${id}.json`), "utf8")) as StoredEmail;
      } catch {
        return undefined;
      }
    },
    findByIdempotencyKey(key) {
      return readAll().find((e) => e.idempotency_key === key);
    },
    clear() {
      let count = 0;
      for (const name of readdirSync(dir)) {
        if (!name.endsWith(".json") && !name.endsWith(".json.tmp")) continue;
        rmSync(path.join(dir, name), { force: true });
        if (name.endsWith(".json")) count += 1;
      }
      return count;
    },
  };
}
