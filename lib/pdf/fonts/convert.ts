// Regenerates the sheet's .ttf files from @fontsource/inter's .woff files (WOFF 1.0: the same sfnt
// tables, each zlib-compressed). fontkit inflates WOFF tables again on every render, which was a
// third of a sheet's render time; the plain TrueType files skip that. Lossless: tables, their
// checksums and the font's own checksum adjustment are copied as they are.
// Run from the project folder: npx tsx lib/pdf/fonts/convert.ts
import { readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import { inflateSync } from "node:zlib";

const SOURCE = path.join("node_modules", "@fontsource", "inter", "files");
const TARGET = path.join("lib", "pdf", "fonts");

export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.toString("latin1", 0, 4) !== "wOFF") throw new Error("not a WOFF 1.0 file");
  const flavor = woff.readUInt32BE(4);
  const count = woff.readUInt16BE(12);
  const tables = Array.from({ length: count }, (_, i) => {
    const o = 44 + i * 20;
    return {
      tag: woff.toString("latin1", o, o + 4),
      offset: woff.readUInt32BE(o + 4),
      compLength: woff.readUInt32BE(o + 8),
      origLength: woff.readUInt32BE(o + 12),
      checksum: woff.readUInt32BE(o + 16),
    };
  }).sort((a, b) => (a.tag < b.tag ? -1 : 1));
  let entrySelector = 0;
  while (2 ** (entrySelector + 1) <= count) entrySelector++;
  const searchRange = 2 ** entrySelector * 16;
  const header = Buffer.alloc(12 + 16 * count);
  header.writeUInt32BE(flavor, 0);
  header.writeUInt16BE(count, 4);
  header.writeUInt16BE(searchRange, 6);
  header.writeUInt16BE(entrySelector, 8);
  header.writeUInt16BE(count * 16 - searchRange, 10);
  const parts: Buffer[] = [header];
  let offset = header.length;
  tables.forEach((t, i) => {
    const raw = woff.subarray(t.offset, t.offset + t.compLength);
    const data = t.compLength < t.origLength ? inflateSync(raw) : raw;
    if (data.length !== t.origLength) throw new Error(`table ${t.tag}: ${data.length} bytes, expected ${t.origLength}`);
    const o = 12 + i * 16;
    header.write(t.tag, o, "latin1");
    header.writeUInt32BE(t.checksum, o + 4);
    header.writeUInt32BE(offset, o + 8);
    header.writeUInt32BE(data.length, o + 12);
    const pad = Buffer.alloc((4 - (data.length % 4)) % 4);
    parts.push(data, pad);
    offset += data.length + pad.length;
  });
  return Buffer.concat(parts);
}

if (process.argv[1]?.endsWith("convert.ts")) {
  for (const subset of ["latin", "latin-ext"]) {
    for (const weight of [400, 600, 700]) {
      const name = `inter-${subset}-${weight}-normal`;
      writeFileSync(path.join(TARGET, `${name}.ttf`), woffToSfnt(readFileSync(path.join(SOURCE, `${name}.woff`))));
      console.log(`${name}.ttf`);
    }
  }
}
