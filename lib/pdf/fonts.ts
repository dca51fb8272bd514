// Inter (SIL Open Font License, lib/pdf/fonts/LICENSE-Inter.txt) shipped with the app as .ttf, made
// losslessly from @fontsource/inter's .woff by lib/pdf/fonts/convert.ts (react-pdf embeds .woff/.ttf,
// not .woff2; .ttf renders faster). The files are read from the project folder, which is the working
// directory of `next start`, `next dev`, vitest and the scripts; @react-pdf/renderer stays an external
// package, so nothing here goes through the bundler.
import { existsSync } from "node:fs";
import path from "node:path";
import { Font } from "@react-pdf/renderer";

export const SHEET_FONT = "SagwiseInter";
/** Latin Extended (ő, ł, ş, …) in a second family, used where the first has no glyph. */
export const SHEET_FONT_EXT = "SagwiseInterExt";
export const SHEET_FONT_STACK = [SHEET_FONT, SHEET_FONT_EXT];

const WEIGHTS = [400, 600, 700] as const;

export function sheetFontDir(): string {
  return path.join(process.cwd(), "lib", "pdf", "fonts");
}

let registered = false;

export function registerSheetFonts(): void {
  if (registered) return;
  const dir = sheetFontDir();
  const file = (subset: string, weight: number) => {
    const src = path.join(dir, `inter-${subset}-${weight}-normal.ttf`);
    if (!existsSync(src)) throw new Error(`Setup sheet font missing: ${src} (run the app from the project folder)`);
    return { src, fontWeight: weight };
  };
  Font.register({ family: SHEET_FONT, fonts: WEIGHTS.map((w) => file("latin", w)) });
  Font.register({ family: SHEET_FONT_EXT, fonts: WEIGHTS.map((w) => file("latin-ext", w)) });
  // Words are never split with a hyphen: a figure like "105–115 mm" must stay whole.
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}
