// Text shaping (fontkit's layout: Inter's contextual alternates, kerning) is the single most
// expensive step of a sheet render, about half of it. Its result depends only on the font, the
// string and the features, and most of every sheet is the same text (cautions, sag steps, labels,
// chart ticks), so each loaded font keeps the runs it has shaped and gives them again, identical,
// on later renders. react-pdf copies what it changes (positions are scaled into new objects, glyph
// arrays are sliced or concatenated), so a run handed out twice is never altered in between.
import { Font } from "@react-pdf/renderer";
import { LRUCache } from "lru-cache";

/**
 * Per font, in characters of kept runs (a shaped character is about 80 bytes, so a few MB at most);
 * all the text of one sheet is under 5,000 characters.
 */
export const SHAPING_CACHE_CHARS = 50_000;
/** Longer runs are one-off text (a tuner's long note): shaped every time, never kept. */
export const SHAPING_CACHE_MAX_RUN = 500;

type Layout = (text: string, features?: unknown, script?: string, language?: string, direction?: string) => unknown;
interface ShapingFont {
  layout: Layout;
  [CACHED]?: ShapingCache;
}
interface FontSourceLike {
  data: unknown;
  load(): Promise<void>;
}

const CACHED = Symbol("sagwise.shapingCache");

/** Shaped runs by key; least recently used go first once full, so the sheet's own text stays. */
export type ShapingCache = LRUCache<string, object>;

function featureKey(features: unknown): string {
  if (features === undefined || features === null) return "";
  if (Array.isArray(features)) return features.length === 0 ? "" : `[${features.join(",")}]`;
  // fontkit adds its defaults to a features object it is given, so the key is taken before the call.
  return JSON.stringify(features);
}

/** Makes a loaded fontkit font reuse its shaped runs; calling it again on the same font does nothing. */
export function cacheShaping(font: ShapingFont): ShapingCache {
  const existing = font[CACHED];
  if (existing) return existing;
  // The text is the tail of its key, so a key's length stands in for the run's size.
  const cache: ShapingCache = new LRUCache({
    maxSize: SHAPING_CACHE_CHARS,
    sizeCalculation: (_run, key) => key.length,
  });
  const layout = font.layout.bind(font);
  font.layout = (text, features, script, language, direction) => {
    if (typeof text !== "string" || text.length > SHAPING_CACHE_MAX_RUN)
      return layout(text, features, script, language, direction);
    const key = `${featureKey(features)}\u0000${script ?? ""}\u0000${language ?? ""}\u0000${direction ?? ""}\u0000${text}`;
    const hit = cache.get(key);
    if (hit !== undefined) return hit;
    const run = layout(text, features, script, language, direction);
    if (typeof run === "object" && run !== null) cache.set(key, run);
    return run;
  };
  font[CACHED] = cache;
  return cache;
}

/** Loads every face of the given families (once per process) and turns on the shaping cache. */
export async function prepareShaping(families: readonly string[]): Promise<void> {
  const registered = Font.getRegisteredFonts() as Record<string, { sources: FontSourceLike[] }>;
  for (const family of families) {
    for (const source of registered[family]?.sources ?? []) {
      await source.load();
      // Checked on every render: a font loaded anew (after Font.reset) is a new object without a cache.
      if (source.data && typeof (source.data as ShapingFont).layout === "function")
        cacheShaping(source.data as ShapingFont);
    }
  }
}
