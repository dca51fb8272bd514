// The build sheet as a PDF (@react-pdf/renderer, the setup sheet's fonts and palette: lib/pdf).
import { Document, Page, Text, View, renderToBuffer } from "@react-pdf/renderer";
import { createElement } from "react";
import { SHEET_FONT_STACK, registerSheetFonts } from "@/lib/pdf/fonts";
import { prepareShaping } from "@/lib/pdf/shaping-cache";
import { COLORS, s } from "@/lib/pdf/styles";
import type { BuildSheet } from "./build-sheet";

const row = {
  flexDirection: "row" as const,
  borderBottomWidth: 0.5,
  borderBottomColor: COLORS.rule,
  paddingVertical: 2,
};
const box = { width: 9, height: 9, borderWidth: 1, borderColor: COLORS.ink, marginRight: 6 };

function BuildSheetDocument({ sheet }: { sheet: BuildSheet }) {
  return (
    <Document title={`Build sheet, order ${sheet.orderNumber}`} author={sheet.shopName}>
      <Page size="A4" style={s.page}>
        <View style={s.header}>
          <View>
            <Text style={s.shopName}>{sheet.shopName}</Text>
            <Text style={s.title}>
              Build sheet · order {sheet.orderNumber} · {sheet.serviceLabel}
            </Text>
            <Text>
              {sheet.riderName} · {sheet.bike} · request {sheet.requestNumber}
              {sheet.sheetVersion ? `, sheet version ${sheet.sheetVersion}` : ""}
            </Text>
          </View>
        </View>
        <Text style={s.h2}>Parts to pick</Text>
        {sheet.springs.map((p, i) => (
          <View key={`s${i}`} style={row}>
            <Text style={{ width: "8%" }}>{p.quantity} ×</Text>
            <Text style={{ width: "32%" }}>{p.what}</Text>
            <Text style={{ width: "30%", fontWeight: 700 }}>{p.rate}</Text>
            <Text style={{ width: "30%" }}>free length {p.freeLength}</Text>
          </View>
        ))}
        {sheet.parts.map((p, i) => (
          <View key={`p${i}`} style={row}>
            <Text style={{ width: "8%" }}>{p.quantity} ×</Text>
            <Text style={{ width: "92%" }}>{p.what}</Text>
          </View>
        ))}
        <Text style={s.h2}>Figures from the approved sheet</Text>
        {sheet.figures.map(([label, value]) => (
          <View key={label} style={row}>
            <Text style={{ width: "50%" }}>{label}</Text>
            <Text style={{ width: "50%", fontWeight: 700 }}>{value}</Text>
          </View>
        ))}
        <Text style={s.h2}>Build notes{sheet.bikeModelName ? ` for ${sheet.bikeModelName}` : ""}</Text>
        <Text>{sheet.buildNotes || "No build notes for this model yet."}</Text>
        <Text style={s.h2}>Steps</Text>
        {sheet.steps.map((step) => (
          <View key={step} style={{ flexDirection: "row", marginBottom: 4 }}>
            <View style={box} />
            <Text>{step}</Text>
          </View>
        ))}
        <Text style={s.h2}>Cautions</Text>
        {sheet.cautions.map((c) => (
          <Text key={c} style={{ color: COLORS.amber }}>
            ⚠ {c}
          </Text>
        ))}
        <View style={{ flexDirection: "row", marginTop: 16 }}>
          <Text style={{ width: "50%" }}>Built by: {sheet.builtBy ?? "________________"}</Text>
          <Text style={{ width: "50%" }}>Tested by: {sheet.testedBy ?? "________________"}</Text>
        </View>
      </Page>
    </Document>
  );
}

export async function renderBuildSheet(sheet: BuildSheet): Promise<Buffer> {
  registerSheetFonts();
  await prepareShaping(SHEET_FONT_STACK);
  return renderToBuffer(createElement(BuildSheetDocument, { sheet }) as Parameters<typeof renderToBuffer>[0]);
}
