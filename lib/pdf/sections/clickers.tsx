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

const near = (a: number, b: number) => Math.abs(a - b) < 1e-9;
const TUNER = "Set by the tuner";
const LIMIT = "Limited to the adjuster's range";

/** "Bottoming: firm fork compression 2 clicks" → "bottoming": the cause a rule's reason names first. */
const cause = (reason: string) => {
  const head = reason.split(":")[0]!.trim();
  return head.charAt(0).toLowerCase() + head.slice(1);
};
const and = (items: string[]) =>
  items.length < 2 ? (items[0] ?? "") : `${items.slice(0, -1).join(", ")} and ${items.at(-1)}`;

/**
 * One reason per adjuster that agrees with where it ends up. Positions count out from fully
 * closed, so out is softer compression or faster rebound, in is firmer or slower (common
 * practice). Only the moves in the net direction explain the setting and the others are named as
 * outweighed; a tuner's setting is its own reason; moves that cancel leave the stock position.
 */
export function clickerReason(c: ClickerSetting): string {
  if (!c.moves.length) return "–";
  const net = c.position - c.stock;
  const rebound = c.id === "forkRebound" || c.id === "shockRebound";
  const rules = c.moves.filter((m) => m.reason !== TUNER && !m.reason.startsWith(LIMIT));
  const limit = c.moves.find((m) => m.reason.startsWith(LIMIT));
  if (c.moves.some((m) => m.reason === TUNER)) {
    return near(net, 0)
      ? "Stock, as set by the tuner"
      : `${clickerCount(Math.abs(net), c.unit)} ${net > 0 ? (rebound ? "faster" : "softer") : rebound ? "slower" : "firmer"} than stock, set by the tuner`;
  }
  const causes = (list: typeof rules) => [...new Set(list.map((m) => cause(m.reason)))];
  if (near(net, 0)) return `Stock: the changes for ${and(causes(rules))} cancel out`;
  const direction = net > 0 ? (rebound ? "faster" : "softer") : rebound ? "slower" : "firmer";
  const agreeing = causes(rules.filter((m) => Math.sign(m.change) === Math.sign(net)));
  const against = causes(rules.filter((m) => Math.sign(m.change) === -Math.sign(net)));
  let text = `${clickerCount(Math.abs(net), c.unit)} ${direction} than stock`;
  if (agreeing.length) text += `, for ${and(agreeing)}`;
  if (against.length) text += ` (outweighs ${and(against)})`;
  if (limit) text += `; limited to the adjuster's range`;
  return text;
}

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
          <Text style={{ width: W.why, fontSize: 8 }}>{clickerReason(c)}</Text>
        </View>
      ))}
    </View>
  );
}
