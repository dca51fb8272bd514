// The whole data model (product.md, "Data kept"), split by area under db/tables.
export * from "./tables/auth";
export * from "./tables/shop";
export * from "./tables/requests";
export * from "./tables/calibration";
