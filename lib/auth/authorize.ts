import "server-only";
import { forbidden, unauthenticated } from "@/lib/errors";
import { getRecentViewer, type Viewer } from "./current";
import { can, type Permission } from "./permissions";

/**
 * The single server-side check for route handlers and server actions: the
 * signed-in viewer holding `permission` in their active workspace, or an
 * AppError (401 unauthenticated, 403 forbidden). The viewer may come from the
 * process's few-second cache (lib/auth/viewer-cache.ts).
 */
export async function authorize(permission: Permission): Promise<Viewer> {
  const viewer = await getRecentViewer();
  if (!viewer) throw unauthenticated();
  if (!can(viewer.role, permission)) throw forbidden(describe(permission));
  return viewer;
}

function describe(permission: Permission): string {
  const [noun, verb] = permission.split(".");
  return `${verb ?? "use"} ${noun ?? "this"}`;
}
