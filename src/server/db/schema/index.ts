// The whole schema, split by area. drizzle.config.ts and the client read it from here.
export * from "./users";
export * from "./club";
export * from "./plans";
export * from "./antenna-days";
export * from "./mail";
export * from "./build-sessions";
export * from "./files";
export * from "./gear";
export * from "./sweeps";
