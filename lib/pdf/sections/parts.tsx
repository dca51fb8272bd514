// Small building blocks shared by the sheet's sections.
import { Text, View } from "@react-pdf/renderer";
import type { ReactNode } from "react";
import { s } from "../styles";

export function KeyValue({ label, children }: { label: string; children: ReactNode }) {
  return (
    <View style={s.kv}>
      <Text style={s.kvLabel}>{label}</Text>
      <Text style={s.kvValue}>{children}</Text>
    </View>
  );
}

export function Bullets({ items, numbered = false }: { items: string[]; numbered?: boolean }) {
  return (
    <View>
      {items.map((item, i) => (
        <View key={i} style={s.bullet}>
          <Text style={s.bulletMark}>{numbered ? `${i + 1}.` : "•"}</Text>
          <Text style={s.bulletText}>{item}</Text>
        </View>
      ))}
    </View>
  );
}
