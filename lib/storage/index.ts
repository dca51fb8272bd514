export * from "./photos";
export * from "./disk";
