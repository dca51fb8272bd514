// Types of the order as the API answers it, for components (which never import the loader itself).
export type { OrderView } from "./view";
