export * from "./workspaces";
export * from "./users";
export * from "./sessions";
export * from "./invitations";
