/** Stamped on every recommendation; bump when any output for the same input can change. */
export const ENGINE_VERSION = "sagwise-sizing/1.0.0";
