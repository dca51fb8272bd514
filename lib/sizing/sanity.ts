import type { BikeSpec } from "./bike-schema";
import type { FrontResult, RearResult, SizingWarning } from "./output-schema";
import { SANITY_LIMITS } from "./defaults";
import { fmt } from "./format";

// Sanity limits (lib/sizing/README.md): past them a figure is almost surely mistyped or the setup
// cannot work, so each warning asks the tuner to acknowledge it before the sheet can be approved.

export function sanityWarnings(bike: BikeSpec, rear: RearResult, front: FrontResult, warnings: SizingWarning[]): void {
  const L = SANITY_LIMITS;
  const ack = (w: Omit<SizingWarning, "requiresAcknowledgement">) =>
    warnings.push({ ...w, requiresAcknowledgement: true });
  const bottoming = [
    ["REAR", "rear", "Rear", rear.bottoming.ratio, "the leverage curve, stroke or spring rate"],
    [
      "FRONT",
      "front",
      "Fork",
      front.bottoming.ratio,
      front.kind === "air" ? "the air chamber volume" : "the oil level, free area or cap volume",
    ],
  ] as const;
  for (const [code, field, End, ratio, suspect] of bottoming)
    if (!(ratio >= L.bottomingRatio.min && ratio <= L.bottomingRatio.max))
      ack({
        code: `${code}_BOTTOMING_IMPLAUSIBLE`,
        severity: "critical",
        message: `${End} force at full travel is ${fmt(ratio, 1)} × the race-sag load, outside ${L.bottomingRatio.min}–${L.bottomingRatio.max} ×: check ${suspect} before approving.`,
        field: `${field}.bottoming.ratio`,
      });
  const p = front.bottomPressureMpaAbs;
  if (front.kind !== "air" && p !== undefined && p > L.forkAirPressureMaxMpa)
    ack({
      code: "FRONT_AIR_GAP_TOO_SMALL",
      severity: "critical",
      message: `The air above the oil reaches ${fmt(p, 1)} MPa at full travel (more than ${L.forkAirPressureMaxMpa} MPa): the air space is implausibly small; check the oil level, free area and cap volume.`,
      field: "front.oilLevelMm",
    });
  const air = bike.fork.air;
  if (front.kind === "air" && air) {
    const ratio = air.chamberVolumeMm3 / (air.chamberVolumeMm3 - air.pistonAreaMm2 * bike.fork.travelMm);
    if (ratio > L.airChamberCompressionRatioMax)
      ack({
        code: "FRONT_AIR_CHAMBER_IMPLAUSIBLE",
        severity: "critical",
        message: `The air chamber compresses ${fmt(ratio, 1)} : 1 over the travel (more than ${L.airChamberCompressionRatioMax} : 1): check the chamber volume and piston area.`,
        field: "bike.fork.air.chamberVolumeMm3",
      });
  }
  const ends = [
    ["REAR", "rear", "Rear", rear.predicted.staticState, rear.naturalFrequencyHz, true],
    ["FRONT", "front", "Fork", front.predicted.staticState, front.naturalFrequencyHz, front.kind !== "air"],
  ] as const;
  for (const [code, field, End, staticState, hz, coil] of ends) {
    if (coil && staticState === "topped-out")
      ack({
        code: `${code}_STATIC_SAG_ZERO`,
        severity: "caution",
        message: `${End} static sag is 0 mm: the preload holds the bike topped out under its own weight; too much preload, or a spring too soft for the rider.`,
        field: `${field}.predicted.staticSagMm`,
      });
    if (!(hz >= L.naturalFrequencyHz.min && hz <= L.naturalFrequencyHz.max))
      ack({
        code: `${code}_FREQUENCY_IMPLAUSIBLE`,
        severity: "caution",
        message: `${End} natural frequency at race sag is ${fmt(hz, 2)} Hz, outside ${L.naturalFrequencyHz.min}–${L.naturalFrequencyHz.max} Hz: check the rate, the masses and the curve.`,
        field: `${field}.naturalFrequencyHz`,
      });
  }
}
