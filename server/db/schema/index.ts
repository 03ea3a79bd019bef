export * from "./users";
export * from "./sessions";
export * from "./groups";
export * from "./outbox";
export * from "./rate-limits";
export * from "./maps";
export * from "./probes";
