/** Stamped on every recommendation; bump when any output for the same input can change.
 *  2.x: ride-frequency rate basis, static sag as a check, negative air chamber, spring steel in the
 *  fork's air volume, sanity limits (lib/sizing/README.md). Stored 1.x recommendations still parse. */
export const ENGINE_VERSION = "sagwise-sizing/2.0.0";
