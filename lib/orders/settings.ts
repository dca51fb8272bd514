// The admin's order settings: currency, tax, deposit or full payment, the stages that e-mail the
// rider, packing instructions; the price list; outside finishers. Every change is audited.
import { recordAudit } from "@/db/queries/audit";
import {
  insertFinisher,
  saveBuildNotes,
  saveOrderSettings,
  updateFinisher,
  upsertPriceItem,
  type OrderSettingsValues,
} from "@/db/queries/orders";
import { inTransaction } from "@/db/queries/transaction";
import { NotFoundError, ValidationError } from "@/lib/errors";
import type { OrderActor } from "./notify";

const audit = (actor: OrderActor, action: string, detail: Record<string, unknown>) => ({
  requestId: null,
  actorUserId: actor.userId,
  actorLabel: actor.label,
  action,
  detail,
});

export async function updateOrderSettings(values: OrderSettingsValues, actor: OrderActor) {
  return inTransaction(async (tx) => {
    const row = await saveOrderSettings(values, tx);
    await recordAudit(audit(actor, "settings.orders_changed", { ...values }), tx);
    return row;
  });
}

export async function savePriceList(items: Parameters<typeof upsertPriceItem>[0][], actor: OrderActor) {
  return inTransaction(async (tx) => {
    const rows = [];
    for (const item of items) rows.push(await upsertPriceItem(item, tx));
    await recordAudit(audit(actor, "settings.price_list_changed", { codes: items.map((i) => i.code) }), tx);
    return rows;
  });
}

export async function addFinisher(values: Parameters<typeof insertFinisher>[0], actor: OrderActor) {
  return inTransaction(async (tx) => {
    const row = await insertFinisher(values, tx);
    await recordAudit(audit(actor, "settings.finisher_added", { finisherId: row.id, name: row.name }), tx);
    return row;
  });
}

export async function changeFinisher(id: string, values: Parameters<typeof updateFinisher>[1], actor: OrderActor) {
  if (!Object.values(values).some((v) => v !== undefined))
    throw new ValidationError("Nothing to change: send the name, work, turnaround or whether it is in use.");
  return inTransaction(async (tx) => {
    const row = await updateFinisher(id, values, tx);
    if (!row) throw new NotFoundError("No such finisher.");
    await recordAudit(audit(actor, "settings.finisher_changed", { finisherId: id, ...values }), tx);
    return row;
  });
}

export async function changeBuildNotes(bikeModelId: string, notes: string | null, actor: OrderActor) {
  if (!(await saveBuildNotes(bikeModelId, notes))) throw new NotFoundError("No such bike model.");
  await recordAudit(audit(actor, "catalog.build_notes_changed", { bikeModelId, length: notes?.length ?? 0 }));
}
