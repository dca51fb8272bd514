// The adjusters' names as riders and tuners read them (the same words as the setup sheet).
import type { ClickerId } from "@/lib/sizing";

export const CLICKER_LABELS: Record<ClickerId, string> = {
  forkCompression: "Fork compression",
  forkRebound: "Fork rebound",
  shockLowSpeedCompression: "Shock compression, low speed",
  shockHighSpeedCompression: "Shock compression, high speed",
  shockRebound: "Shock rebound",
};
