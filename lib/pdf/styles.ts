// One stylesheet for the setup sheet: our pine palette, printable in black and white (every colour
// has text or a line style beside it).
import { StyleSheet } from "@react-pdf/renderer";
import { SHEET_FONT_STACK } from "./fonts";

export const COLORS = {
  pine: "#185a4b",
  pineDark: "#0c2c26",
  pineLight: "#eef7f4",
  amber: "#92400e",
  amberLight: "#fffbeb",
  ink: "#1c1917",
  muted: "#57534e",
  rule: "#d6d3d1",
  watermark: "#b91c1c",
};

export const s = StyleSheet.create({
  page: { fontFamily: SHEET_FONT_STACK, fontSize: 9, color: COLORS.ink, paddingTop: 32, paddingBottom: 48, paddingHorizontal: 36 },
  header: { flexDirection: "row", justifyContent: "space-between", borderBottomWidth: 2, borderBottomColor: COLORS.pine, paddingBottom: 8, marginBottom: 10 },
  shopName: { fontSize: 15, fontWeight: 700, color: COLORS.pineDark },
  contact: { fontSize: 8, color: COLORS.muted, textAlign: "right" },
  title: { fontSize: 13, fontWeight: 700, color: COLORS.pine, marginTop: 4 },
  h2: { fontSize: 11, fontWeight: 700, color: COLORS.pineDark, marginBottom: 4, marginTop: 10 },
  h3: { fontSize: 9.5, fontWeight: 600, color: COLORS.pineDark, marginBottom: 2, marginTop: 4 },
  muted: { color: COLORS.muted },
  small: { fontSize: 7.5, color: COLORS.muted },
  row: { flexDirection: "row", gap: 12 },
  col: { flex: 1 },
  card: { borderWidth: 1, borderColor: COLORS.rule, borderRadius: 4, padding: 8 },
  kv: { flexDirection: "row", paddingVertical: 1.5, borderBottomWidth: 0.5, borderBottomColor: COLORS.rule },
  kvLabel: { width: "42%", color: COLORS.muted },
  kvValue: { width: "58%", fontWeight: 600 },
  caution: { borderWidth: 1.5, borderColor: COLORS.amber, backgroundColor: COLORS.amberLight, borderRadius: 4, padding: 8, marginTop: 8 },
  cautionTitle: { fontSize: 10, fontWeight: 700, color: COLORS.amber, marginBottom: 3 },
  bullet: { flexDirection: "row", marginBottom: 2 },
  bulletMark: { width: 12 },
  // No lineHeight anywhere: set on the page, react-pdf drops the fixed footer's page numbers.
  bulletText: { flex: 1 },
  tableHead: { flexDirection: "row", backgroundColor: COLORS.pineLight, paddingVertical: 3, paddingHorizontal: 4, fontWeight: 600 },
  tableRow: { flexDirection: "row", paddingVertical: 3, paddingHorizontal: 4, borderBottomWidth: 0.5, borderBottomColor: COLORS.rule },
  footer: { position: "absolute", bottom: 20, left: 36, right: 36, flexDirection: "row", justifyContent: "space-between", fontSize: 7.5, color: COLORS.muted, borderTopWidth: 0.5, borderTopColor: COLORS.rule, paddingTop: 4 },
  watermark: { position: "absolute", top: 330, left: 60, fontSize: 110, fontWeight: 700, color: COLORS.watermark, opacity: 0.14, transform: "rotate(-35deg)" },
  draftBanner: { position: "absolute", top: 12, left: 36, right: 36, textAlign: "center", fontSize: 8, fontWeight: 700, color: COLORS.watermark },
  link: { color: COLORS.pine, textDecoration: "underline" },
});
