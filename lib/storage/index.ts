export * from "./photos";
export * from "./store";
export { uploadsDir } from "./disk";
