// Reads a PDF the way a person's viewer would, with poppler-utils (pdftotext, pdfinfo).
import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { PNG } from "pngjs";

function withFile<T>(pdf: Uint8Array, fn: (file: string) => T): T {
  const dir = mkdtempSync(path.join(os.tmpdir(), "sagwise-pdf-"));
  const file = path.join(dir, "sheet.pdf");
  try {
    writeFileSync(file, pdf);
    return fn(file);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** `pdftotext -layout` output; pages are separated by form feeds. */
export function pdfText(pdf: Uint8Array): string {
  return withFile(pdf, (file) => execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" }));
}

export function pdfInfo(pdf: Uint8Array): Record<string, string> {
  const out = withFile(pdf, (file) => execFileSync("pdfinfo", [file], { encoding: "utf8" }));
  return Object.fromEntries(
    out
      .split("\n")
      .filter((line) => line.includes(":"))
      .map((line) => [line.slice(0, line.indexOf(":")).trim(), line.slice(line.indexOf(":") + 1).trim()]),
  );
}

/** Text with runs of spaces collapsed, so a figure split by layout columns still reads as one line. */
export function squash(text: string): string {
  return text.replace(/[ \t]+/g, " ");
}

/** Rows of `pdffonts`: name and whether it is embedded. */
export function pdfFonts(pdf: Uint8Array): { name: string; embedded: boolean }[] {
  const out = withFile(pdf, (file) => execFileSync("pdffonts", [file], { encoding: "utf8" }));
  return out
    .split("\n")
    .slice(2)
    .filter((line) => line.trim())
    .map((line) => ({ name: line.split(/\s+/)[0]!, embedded: /\byes\s+yes\s+(yes|no)\s+\d+\s+\d+\s*$/.test(line) }));
}

/** One page rendered to PNG by `pdftoppm` (poppler-utils) at `dpi`, as RGBA pixels (pngjs). */
export function pdfPagePixels(
  pdf: Uint8Array,
  page: number,
  dpi = 200,
): { data: Uint8ClampedArray; width: number; height: number } {
  return withFile(pdf, (file) => {
    const root = path.join(path.dirname(file), "page");
    execFileSync("pdftoppm", [
      "-png",
      "-r",
      String(dpi),
      "-f",
      String(page),
      "-l",
      String(page),
      "-singlefile",
      file,
      root,
    ]);
    const image = PNG.sync.read(readFileSync(`${root}.png`));
    return {
      data: new Uint8ClampedArray(image.data.buffer, image.data.byteOffset, image.data.length),
      width: image.width,
      height: image.height,
    };
  });
}
