import type { RequestHandler } from 'express';
import type { PermissionGuard } from '@/server/middleware/auth';
import type { RolePermission } from '@/shared/rules/permissions';

export interface ApiRoute {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  path: string;
  /** The permission a `requirePermission` on the route (or on a `router.use` in front of it) asks for. */
  permission: RolePermission | null;
}

type Handle = RequestHandler & Partial<Pick<PermissionGuard, 'permission'>> & { stack?: Layer[] };
interface Layer {
  route?: { path: string; methods: Record<string, boolean>; stack: Layer[] };
  handle?: Handle;
  match(path: string): boolean;
}

/** A path with every parameter filled: ids with `id`, other parameters (a system's name) with a word. */
export const fillPath = (path: string, id: number | string) => path.replace(/:(\w+)/g, (_m, name: string) => (name === 'id' ? String(id) : 'LTHW'));

/**
 * Every route of the app, read from Express's own router (/api + each sub-router's route paths), so a new route
 * is walked without being listed, with the named permission that guards it, if any.
 */
export function apiRoutes(app: unknown): ApiRoute[] {
  const found: ApiRoute[] = [];
  const walk = (stack: Layer[]) => {
    const guards: Layer[] = [];
    for (const layer of stack) {
      if (layer.route) {
        const own = layer.route.stack.find((l) => l.handle?.permission)?.handle?.permission;
        const path = layer.route.path;
        const inFront = guards.find((g) => g.match(fillPath(path, 1)))?.handle?.permission;
        for (const m of Object.keys(layer.route.methods)) found.push({ method: m as ApiRoute['method'], path: `/api${path}`, permission: own ?? inFront ?? null });
      } else if (layer.handle?.stack) walk(layer.handle.stack);
      else if (layer.handle?.permission) guards.push(layer);
    }
  };
  walk((app as { router: { stack: Layer[] } }).router.stack);
  return found.filter((r) => r.path.startsWith('/api/'));
}
