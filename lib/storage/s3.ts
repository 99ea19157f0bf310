import "server-only";

/** The app's door to object storage (lib/storage/object-store.ts), kept out of client bundles. */
export { deleteObject, getObject, putObject } from "./object-store";
