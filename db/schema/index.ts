export * from "./auth";
export * from "./firm";
export * from "./project";
export * from "./invitation";
export * from "./room";
export * from "./notification";
export * from "./audit";
