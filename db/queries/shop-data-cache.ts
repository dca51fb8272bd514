// A per-process copy of the shop-wide tables every submit reads (catalog bikes with their
// calibrations, targets, spring stock, clicker rules, settings), so a rider's submit reads one small
// row instead of six queries and re-validating their jsonb. The database keeps the copy honest:
// statement triggers give shop_data_epoch a new random token on every write to those tables, in
// the writer's transaction (migration 0006_shop_data_epoch). Each use reads the token first and
// drops the copy when it differs, so a change made by another instance, a script or psql shows on
// the next request. Reading the token before the data means a copy can only be newer than its
// token says, never older; a token is random, so even a restored backup cannot match a copy made
// from other data.
import { getDatabase, type DatabaseHandle } from "@/db/client";
import { prepared } from "@/db/prepared";
import { shopDataEpoch } from "@/db/schema";

/** Cached values by key for one epoch; capped so that lookups of unknown keys cannot grow it. */
interface EpochCopy {
  epoch: string;
  values: Map<string, Promise<unknown>>;
}

const MAX_ENTRIES = 1000;

// On globalThis, like the database handle itself: Next.js may load this module more than once.
const holder = globalThis as unknown as { __sagwiseShopData?: WeakMap<DatabaseHandle, EpochCopy> };
const copies = (holder.__sagwiseShopData ??= new WeakMap());

export interface ShopDataCache {
  /**
   * The value under `key`, loaded with `load` on the first use in this epoch. Each caller gets its
   * own copy (structuredClone), so changing it cannot change what the next request sees.
   */
  get<T>(key: string, load: () => Promise<T>): Promise<T>;
}

const currentEpoch = prepared("shop_data_epoch", (db, name) =>
  db.select({ epoch: shopDataEpoch.epoch }).from(shopDataEpoch).limit(1).prepare(name),
);

/** Checks the token once; the returned cache serves one request (or one unit of work). */
export async function shopDataCache(): Promise<ShopDataCache> {
  const handle = await getDatabase();
  const epoch = (await currentEpoch(handle.db).execute())[0]?.epoch;
  // No token row (a database someone emptied by hand): nothing can be trusted, so read every time.
  if (!epoch) return { get: (_key, load) => load() };
  let copy = copies.get(handle);
  if (!copy || copy.epoch !== epoch) {
    copy = { epoch, values: new Map() };
    copies.set(handle, copy);
  }
  const current = copy;
  return {
    async get<T>(key: string, load: () => Promise<T>): Promise<T> {
      let pending = current.values.get(key) as Promise<T> | undefined;
      if (!pending) {
        if (current.values.size >= MAX_ENTRIES) current.values.clear();
        pending = load();
        current.values.set(key, pending);
        // A failed read is not kept: the next request tries again.
        pending.catch(() => {
          if (current.values.get(key) === pending) current.values.delete(key);
        });
      }
      return structuredClone(await pending);
    },
  };
}
