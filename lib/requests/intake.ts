// A new setup request from the public form: bike spec from the catalog (or the nearest generic
// class for a bike the shop does not list), the engine's first proposal, photos on disk, then one
// database transaction, which also queues the rider's confirmation e-mail (sent by the outbox worker
// after the commit: the submit never waits for it). Photos are written (and fsynced) first and
// removed again if the transaction fails, so a refused or failed request leaves nothing behind.
import { findActiveBike, findNearestGenericBike, insertSetupRequest, type CatalogBike } from "@/db/queries/intake";
import { shopDataCache, type ShopDataCache } from "@/db/queries/shop-data-cache";
import { loadShopSizingContext } from "@/db/queries/sizing-context";
import { ValidationError } from "@/lib/errors";
import { kickOutbox } from "@/lib/mail";
import { notifyRider } from "@/lib/notify";
import { notifyStaff } from "@/lib/notify-staff";
import { buildSizingInput, toKg, toMm } from "@/lib/requests/sizing-input";
import { newStatusToken } from "@/lib/requests/token";
import { SizingInputError, recommend, type BikeSpecInput, type Recommendation } from "@/lib/sizing";
import { checkPhotos, removeUploads, writeUploads, type IncomingPhoto } from "@/lib/storage";
import type { RequestAnswers } from "@/lib/validations/request";

// Engine input paths back to the form's fields, so an engine refusal still names what to fix.
const ENGINE_TO_FORM: [RegExp, string][] = [
  [/^rider\.massKg/, "rider.weight.value"],
  [/^rider\.heightCm/, "rider.height.value"],
  [/^measuredSag\.rearStaticSagMm/, "feel.currentSag.rearStatic"],
  [/^measuredSag\.rearRaceSagMm/, "feel.currentSag.rearRace"],
  [/^measuredSag\.forkStaticSagMm/, "feel.currentSag.forkStatic"],
  [/^measuredSag\.forkRaceSagMm/, "feel.currentSag.forkRace"],
  [/^riding\.hoursPerMonth/, "riding.hoursPerMonth"],
  [/^bike\.massKg/, "bike.notListed.mass.value"],
  [/^bike\./, "bike.modelId"],
];

function engineFields(error: SizingInputError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = ENGINE_TO_FORM.find(([re]) => re.test(issue.path))?.[1] ?? "_";
    fields[key] ??= issue.message;
  }
  return fields;
}

interface ResolvedBike {
  modelId: string | null;
  bikeClass: string | null;
  label: string;
  spec: BikeSpecInput;
  /** Set for a bike the catalog does not list: what the figures were based on. */
  basis?: CatalogBike;
}

async function resolveBike(bike: RequestAnswers["bike"], cache: ShopDataCache): Promise<ResolvedBike> {
  if (bike.modelId) {
    const found = await findActiveBike(bike.modelId, cache);
    if (!found)
      throw new ValidationError("Some fields need attention.", {
        "bike.modelId": "That bike is no longer in the shop's list: pick another or choose “not listed”",
      });
    return { modelId: found.id, bikeClass: found.bikeClass, label: found.name, spec: found.spec };
  }
  const notListed = bike.notListed!;
  const travelMm = toMm(notListed.rearWheelTravel.value, notListed.rearWheelTravel.unit);
  const basis = await findNearestGenericBike(travelMm);
  if (!basis)
    throw new ValidationError("Some fields need attention.", {
      "bike.modelId": "The shop has no bikes to size against yet",
    });
  const spec = notListed.mass ? { ...basis.spec, massKg: toKg(notListed.mass) } : basis.spec;
  return { modelId: null, bikeClass: null, label: notListed.description, spec, basis };
}

/** A visible note that the figures rest on a generic class: the tuner must check them. */
function markNotListed(output: Recommendation, bike: ResolvedBike, answers: RequestAnswers): Recommendation {
  const n = answers.bike.notListed!;
  const given = `${n.rearWheelTravel.value} ${n.rearWheelTravel.unit} rear and ${n.forkTravel.value} ${n.forkTravel.unit} fork travel${n.mass ? `, ${n.mass.value} ${n.mass.unit}` : ""}`;
  const message =
    `Bike not in the catalog (“${bike.label}”, ${given}): sized on the generic class “${bike.basis!.name}”, ` +
    `the nearest by rear wheel travel${n.mass ? ", with the rider's bike weight" : ""}. Linkage, fork and clicker figures are that class's typical values, ` +
    "not this bike's: the tuner must check every figure against the real bike before approving.";
  return {
    ...output,
    warnings: [{ code: "BIKE_NOT_LISTED", severity: "caution", message, field: "bike" }, ...output.warnings],
    reasons: [message, ...output.reasons],
  };
}

export async function submitSetupRequest(answers: RequestAnswers, photos: IncomingPhoto[]) {
  const checked = await checkPhotos(photos);
  // The catalog, targets, stock and rules as of one check of the shop's data (one small query).
  const cache = await shopDataCache();
  const bike = await resolveBike(answers.bike, cache);
  const context = await loadShopSizingContext(bike.spec, answers.riding.discipline, answers.rider.skill, cache);
  const input = buildSizingInput(answers, context);
  let output: Recommendation;
  try {
    output = recommend(input);
  } catch (error) {
    if (error instanceof SizingInputError)
      throw new ValidationError("Some answers cannot be sized.", engineFields(error));
    throw error;
  }
  if (bike.basis) output = markNotListed(output, bike, answers);

  const stored = await writeUploads(checked);
  const statusToken = newStatusToken();
  try {
    const row = await insertSetupRequest(
      {
        request: {
          riderName: answers.rider.name,
          riderEmail: answers.rider.email.toLowerCase(),
          riderPhone: answers.rider.phone || null,
          discipline: answers.riding.discipline,
          skill: answers.rider.skill,
          bikeModelId: bike.modelId,
          bikeClass: bike.bikeClass,
          bikeLabel: bike.label,
          bikeYear: answers.bike.year ?? null,
          riderMassKg: toKg(answers.rider.weight),
          answers,
        },
        uploads: checked.map((photo, i) => ({
          storageKey: stored[i]!.storageKey,
          sha256: stored[i]!.sha256,
          sizeBytes: stored[i]!.sizeBytes,
          originalName: photo.originalName,
          contentType: photo.contentType,
        })),
        input,
        output,
        statusToken,
      },
      async (tx, created) => {
        await notifyRider(tx, created.id, { kind: "request-received" }, { statusToken });
        await notifyStaff(tx, { kind: "new-request", requestId: created.id });
      },
    );
    kickOutbox();
    return { ...row, statusToken };
  } catch (error) {
    await removeUploads(stored.map((s) => s.storageKey));
    throw error;
  }
}
