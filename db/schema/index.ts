export * from "./workspaces";
export * from "./users";
export * from "./sessions";
