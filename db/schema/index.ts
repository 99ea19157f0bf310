export * from "./workspaces";
export * from "./users";
export * from "./sessions";
export * from "./invitations";
export * from "./suppliers";
export * from "./ingredients";
export * from "./prices";
