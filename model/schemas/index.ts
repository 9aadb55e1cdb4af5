// The request and entity shapes of the API, by area. Pure zod over the core's schemas.
export * from "./common";
export * from "./library";
export * from "./studies";
export * from "./settings";
export * from "./jobs";
