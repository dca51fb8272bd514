// Public API of the setup sheet module.
export { renderSetupSheet } from "./render";
export { paperSizeOf, sheetDateOf, sheetFileName, type SheetData, type PaperSize } from "./sheet-data";
export { CAUTIONS, SAG_STEPS } from "./sections/guidance";
export { CLICKER_NAMES } from "./sections/clickers";
