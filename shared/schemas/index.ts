export * from "./errors";
export * from "./common";
export * from "./auth";
export * from "./groups";
export * from "./admin";
export * from "./api-paths";
