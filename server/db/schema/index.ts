export * from "./organizations";
export * from "./users";
export * from "./tokens";
export * from "./audit-and-mail";
export * from "./materials";
export * from "./designs";
export * from "./boil-off-tests";
