import { slot } from "../support/slot";

export const E2E_PORT = 3100 + 10 * slot;
export const E2E_BASE_URL = `http://127.0.0.1:${E2E_PORT}`;
/** Each slot builds into its own folder so parallel runs never share a build. */
export const E2E_DIST_DIR = slot === 0 ? ".next" : `.next-slot${slot}`;
