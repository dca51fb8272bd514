// A QR code drawn as vector squares, from the `qrcode` package's module matrix (ISO/IEC 18004):
// no image file, no binary, sharp at any print size. Error correction M (about 15 % of the symbol
// may be damaged, ISO/IEC 18004 table 1): a sheet in a garage gets dirty. A quiet zone of four
// modules on every side, as the standard asks.
import { Path, Rect, Svg } from "@react-pdf/renderer";
import QRCode from "qrcode";

const QUIET = 4;

/** The SVG path of the dark modules, one unit square each, offset by the quiet zone. */
export function qrPath(text: string): { size: number; d: string } {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: "M" });
  const n = modules.size;
  let d = "";
  for (let row = 0; row < n; row++)
    for (let col = 0; col < n; col++) if (modules.get(row, col)) d += `M${col + QUIET} ${row + QUIET}h1v1h-1z`;
  return { size: n + 2 * QUIET, d };
}

export function QrCode({ text, width }: { text: string; width: number }) {
  const { size, d } = qrPath(text);
  return (
    <Svg width={width} height={width} viewBox={`0 0 ${size} ${size}`}>
      <Rect x={0} y={0} width={size} height={size} fill="#ffffff" />
      <Path d={d} fill="#000000" />
    </Svg>
  );
}
