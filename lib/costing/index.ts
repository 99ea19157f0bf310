/** The buyer's costing: pure functions shared by the server and the browser. */
export * from "./types";
export * from "./settings";
export * from "./options";
export * from "./choices";
export * from "./combination";
export * from "./flags";
export * from "./sensitivity";
export * from "./report";
export * from "./comparison-csv";
