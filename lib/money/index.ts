export * from "./currency";
export * from "./totals";
