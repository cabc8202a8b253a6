export * from "./auth";
export * from "./catalogue";
export * from "./results";
export * from "./summaries";
export * from "./community";
export * from "./system";
export * from "./relations";
