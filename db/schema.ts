// The whole data model (docs/architecture.md, "Data"), split by area under db/tables.
export * from "./tables/auth";
export * from "./tables/shop";
export * from "./tables/requests";
export * from "./tables/calibration";
export * from "./tables/notices";
export * from "./tables/email-wording";
export * from "./tables/ride-feedback";
export * from "./tables/service";
export * from "./tables/orders";
