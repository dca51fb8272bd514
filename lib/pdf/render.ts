// Renders a setup sheet to PDF bytes on the server.
import { renderToBuffer } from "@react-pdf/renderer";
import { createElement } from "react";
import { registerSheetFonts } from "./fonts";
import { SetupSheet } from "./setup-sheet";
import type { SheetData } from "./sheet-data";

export async function renderSetupSheet(data: SheetData): Promise<Buffer> {
  registerSheetFonts();
  return renderToBuffer(createElement(SetupSheet, { data }) as Parameters<typeof renderToBuffer>[0]);
}
