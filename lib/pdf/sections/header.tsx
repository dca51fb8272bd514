// Shop header, the sheet's title, and who approved which version when.
import { Text, View } from "@react-pdf/renderer";
import { sheetDate } from "../format";
import type { SheetData } from "../sheet-data";
import { s } from "../styles";

export function approvalLine(version: SheetData["version"]): string {
  if (version.state === "draft" || !version.approvedAt) return `Version ${version.number} · draft, not approved yet`;
  const by = version.approverName ? ` by ${version.approverName}` : "";
  return `Version ${version.number} · approved ${sheetDate(version.approvedAt)}${by}`;
}

export function SheetHeader({ data }: { data: SheetData }) {
  const { shop, request, version } = data;
  const contact = [shop.email, shop.phone, shop.website].filter(Boolean).join(" · ");
  return (
    <View style={s.header}>
      <View>
        <Text style={s.shopName}>{shop.name}</Text>
        <Text style={s.title}>Suspension setup sheet · request {request.number}</Text>
        <Text>{approvalLine(version)}</Text>
        {version.state === "superseded" ? (
          <Text style={{ color: "#92400e", fontWeight: 600 }}>
            A newer version of this sheet exists: use the latest one your shop sent you.
          </Text>
        ) : null}
      </View>
      <View style={{ maxWidth: 200 }}>
        {shop.address ? <Text style={s.contact}>{shop.address}</Text> : null}
        <Text style={s.contact}>{contact}</Text>
      </View>
    </View>
  );
}
