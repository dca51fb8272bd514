// Renders a setup sheet to PDF bytes on the server.
import { renderToBuffer } from "@react-pdf/renderer";
import { createElement } from "react";
import { SHEET_FONT_STACK, registerSheetFonts } from "./fonts";
import { prepareShaping } from "./shaping-cache";
import { SetupSheet } from "./setup-sheet";
import type { SheetData } from "./sheet-data";

export async function renderSetupSheet(data: SheetData): Promise<Buffer> {
  registerSheetFonts();
  await prepareShaping(SHEET_FONT_STACK);
  return renderToBuffer(createElement(SetupSheet, { data }) as Parameters<typeof renderToBuffer>[0]);
}
