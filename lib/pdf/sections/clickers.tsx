// Starting clicker positions, counted out from fully closed, with the stock position and the reason
// for any move from stock.
import { Text, View } from "@react-pdf/renderer";
import { CLICKER_LABELS } from "@/lib/labels";
import type { ClickerSetting } from "@/lib/sizing";
import { clickerCount } from "../format";
import { s } from "../styles";

/** The sheet uses the shop's one vocabulary (lib/labels.ts). */
export const CLICKER_NAMES = CLICKER_LABELS;

const W = { name: "30%", start: "17%", stock: "15%", why: "38%" };

export function Clickers({ clickers }: { clickers: ClickerSetting[] }) {
  return (
    <View wrap={false}>
      <Text style={s.h2}>Starting clicker positions</Text>
      <Text style={{ marginBottom: 4 }}>
        Turn each adjuster in gently until it stops (fully closed; never force it), then count out the number given.
        Start here, ride, and change one adjuster at a time.
      </Text>
      <View style={s.tableHead}>
        <Text style={{ width: W.name }}>Adjuster</Text>
        <Text style={{ width: W.start }}>Start: out from closed</Text>
        <Text style={{ width: W.stock }}>Stock</Text>
        <Text style={{ width: W.why }}>Why it differs from stock</Text>
      </View>
      {clickers.map((c) => (
        <View key={c.id} style={s.tableRow}>
          <Text style={{ width: W.name }}>{CLICKER_NAMES[c.id]}</Text>
          <Text style={{ width: W.start, fontWeight: 700 }}>{clickerCount(c.position, c.unit)}</Text>
          <Text style={{ width: W.stock }}>{clickerCount(c.stock, c.unit)}</Text>
          <Text style={{ width: W.why, fontSize: 8 }}>
            {c.moves.length ? c.moves.map((m) => m.reason).join("; ") : "–"}
          </Text>
        </View>
      ))}
    </View>
  );
}
