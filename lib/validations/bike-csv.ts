// Catalog CSV: one row per model, the spec flattened into dotted columns so a spreadsheet can edit
// it; the leverage curve is one cell of "wheel mm:ratio" pairs separated by semicolons.
import Papa from "papaparse";
import type { BikeSpecInput } from "@/lib/sizing";
import { bikeModelSchema, type BikeModelValues } from "./bike";
import { fieldMessages } from "@/lib/errors";

const CURVE = "spec.rear.leverageCurve";

/** Column order of the file; spec paths are the engine's field names. */
export const CATALOG_CSV_COLUMNS = [
  "slug",
  "name",
  "bikeClass",
  "yearFrom",
  "yearTo",
  "retired",
  "notes",
  "forkOilType",
  "forkOilVolumeMl",
  "spec.massKg",
  "spec.frontFraction",
  "spec.unsprungFrontKg",
  "spec.unsprungRearKg",
  "spec.rakeDeg",
  "spec.referenceRiderMassKg",
  "spec.riderMassRangeKg.min",
  "spec.riderMassRangeKg.max",
  "spec.rear.wheelTravelMm",
  "spec.rear.shockStrokeMm",
  CURVE,
  "spec.rear.preloadMinMm",
  "spec.rear.preloadMaxMm",
  "spec.rear.collarPitchMm",
  "spec.rear.stockRateNmm",
  "spec.fork.kind",
  "spec.fork.travelMm",
  "spec.fork.preloadMinMm",
  "spec.fork.preloadMaxMm",
  "spec.fork.stockPreloadMm",
  "spec.fork.stockRateNmm",
  "spec.fork.displacementDiameterMm",
  "spec.fork.freeAreaMm2",
  "spec.fork.capVolumeMm3",
  "spec.fork.oilLevelMinMm",
  "spec.fork.oilLevelMaxMm",
  "spec.fork.stockOilLevelMm",
  "spec.fork.air.pistonAreaMm2",
  "spec.fork.air.chamberVolumeMm3",
  "spec.fork.air.stockPressureKpaGauge",
  "spec.fork.air.negativeChamberVolumeMm3",
  "spec.fork.air.equalizeAtMm",
  "spec.fork.stockSpring.wireDiameterMm",
  "spec.fork.stockSpring.meanCoilDiameterMm",
  "spec.fork.stockSpring.totalCoils",
  ...[
    "forkCompression",
    "forkRebound",
    "shockLowSpeedCompression",
    "shockHighSpeedCompression",
    "shockRebound",
  ].flatMap((c) => ["min", "max", "stock"].map((k) => `spec.clickers.${c}.${k}`)),
] as const;

const TEXT_COLUMNS = new Set(["slug", "name", "bikeClass", "notes", "forkOilType", "spec.fork.kind"]);

function getPath(obj: unknown, path: string): unknown {
  return path
    .split(".")
    .reduce<unknown>((o, k) => (o && typeof o === "object" ? (o as Record<string, unknown>)[k] : undefined), obj);
}

function setPath(obj: Record<string, unknown>, path: string, value: unknown) {
  const keys = path.split(".");
  let o = obj;
  for (const k of keys.slice(0, -1)) o = (o[k] ??= {}) as Record<string, unknown>;
  o[keys[keys.length - 1]!] = value;
}

export interface CatalogCsvModel {
  slug: string;
  name: string;
  bikeClass: string;
  yearFrom: number | null;
  yearTo: number | null;
  notes: string | null;
  forkOilType?: string | null;
  forkOilVolumeMl?: number | null;
  retiredAt: Date | null;
  spec: unknown;
}

export function catalogToCsv(models: CatalogCsvModel[]): string {
  const data = models.map((m) =>
    CATALOG_CSV_COLUMNS.map((col) => {
      if (col === "retired") return m.retiredAt ? "yes" : "";
      if (col === CURVE) {
        const curve = getPath(m, col) as BikeSpecInput["rear"]["leverageCurve"];
        return curve.map((p) => `${p.wheelTravelMm}:${p.ratio}`).join("; ");
      }
      const v = getPath(m, col);
      return v === undefined || v === null ? "" : String(v);
    }),
  );
  return Papa.unparse({ fields: [...CATALOG_CSV_COLUMNS], data }, { newline: "\n" });
}

export type CsvRowResult =
  | { row: number; ok: true; slug: string; values: BikeModelValues; retired: boolean }
  | { row: number; ok: false; slug: string | null; fields: Record<string, string> };

/** Parses and validates every row on its own; `row` counts the header as row 1, as a spreadsheet does. */
export function parseCatalogCsv(text: string): { results: CsvRowResult[]; fileError?: string } {
  const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ""), {
    header: true,
    skipEmptyLines: "greedy",
  });
  const headers = parsed.meta.fields ?? [];
  const missing = ["slug", "name", "bikeClass", CURVE].filter((c) => !headers.includes(c));
  if (missing.length) return { results: [], fileError: `Missing columns: ${missing.join(", ")}` };
  const results = parsed.data.map((raw, i): CsvRowResult => {
    const row = i + 2;
    const fields: Record<string, string> = {};
    const model: Record<string, unknown> = {};
    for (const col of CATALOG_CSV_COLUMNS) {
      const cell = (raw[col] ?? "").trim();
      if (col === "retired" || cell === "") continue;
      if (TEXT_COLUMNS.has(col)) setPath(model, col, cell);
      else if (col === CURVE) {
        const points = cell.split(";").map((pair) => pair.split(":").map((s) => Number(s.trim())));
        if (points.some((p) => p.length !== 2 || p.some((n) => !Number.isFinite(n))))
          fields[col] = 'Write the curve as "wheel mm:ratio" pairs separated by semicolons';
        else
          setPath(
            model,
            col,
            points.map(([wheelTravelMm, ratio]) => ({ wheelTravelMm, ratio })),
          );
      } else {
        const n = Number(cell);
        if (!Number.isFinite(n)) fields[col] = `"${cell}" is not a number`;
        else setPath(model, col, n);
      }
    }
    const slug = (raw.slug ?? "").trim() || null;
    if (Object.keys(fields).length) return { row, ok: false, slug, fields };
    const result = bikeModelSchema.safeParse(model);
    if (!result.success) return { row, ok: false, slug, fields: fieldMessages(result.error.issues) };
    const retired = /^(yes|true|1)$/i.test((raw.retired ?? "").trim());
    return { row, ok: true, slug: result.data.slug, values: result.data, retired };
  });
  // The same slug twice in one file: the later row would silently replace the earlier.
  const seen = new Map<string, number>();
  return {
    results: results.map((r) => {
      if (!r.ok) return r;
      const first = seen.get(r.slug);
      if (first !== undefined)
        return { row: r.row, ok: false, slug: r.slug, fields: { slug: `Same slug as row ${first}` } };
      seen.set(r.slug, r.row);
      return r;
    }),
  };
}
