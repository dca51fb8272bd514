// Everything one setup sheet shows, as plain data. Built from the stored version (its output,
// approval time and approver), never from the clock, so the same version always prints the same.
import type { Recommendation } from "@/lib/sizing";

export type PaperSize = "A4" | "LETTER";

export interface SheetShop {
  name: string;
  email: string;
  phone: string | null;
  address: string | null;
  website: string | null;
  imperial: boolean;
  paperSize: PaperSize;
  footer: string | null;
}

export interface SheetRequest {
  number: number;
  riderName: string;
  bikeLabel: string;
  bikeYear: number | null;
  discipline: string;
  skill: string;
  /** The weight as the rider typed it (value and unit), and whether gear was included. */
  riderWeight: { value: number; unit: "kg" | "lb" } | null;
  gearIncluded: boolean | null;
  /** From the catalog model, where the shop filled them in. */
  forkOil: { type: string | null; volumeMlPerLeg: number | null };
}

export interface SheetVersion {
  number: number;
  state: "draft" | "approved" | "superseded";
  approvedAt: Date | null;
  approverName: string | null;
  notesForRider: string | null;
  /** When the version was last changed: the sheet's PDF date for drafts. */
  updatedAt: Date;
}

export interface SheetData {
  shop: SheetShop;
  request: SheetRequest;
  version: SheetVersion;
  recommendation: Recommendation;
  /** The rider's private link for reporting measured sag; none on a draft preview (not approved, no live link). */
  reportUrl: string | null;
  /** Watermark every page: a preview of a version that is not approved. */
  draft: boolean;
}

export function paperSizeOf(value: string | null | undefined): PaperSize {
  return value === "LETTER" ? "LETTER" : "A4";
}

/** The date a sheet carries, in the PDF metadata too: approval, or the draft's last change. */
export function sheetDateOf(version: SheetVersion): Date {
  return version.approvedAt ?? version.updatedAt;
}

export function sheetFileName(requestNumber: number, version: number, draft: boolean): string {
  return `setup-sheet-${requestNumber}-v${version}${draft ? "-draft" : ""}.pdf`;
}
