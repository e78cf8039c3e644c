import { API_ROUTERS } from "../../server/app";

/** Every API route as `METHOD /api/prefix/path`, read from the routers the app mounts. */
export type Route = { method: string; path: string };

export function apiRoutes(): Route[] {
  const out: Route[] = [];
  for (const [prefix, router] of API_ROUTERS) {
    for (const layer of router.stack as { route?: { path: string; methods: Record<string, boolean> } }[]) {
      if (!layer.route) continue;
      for (const method of Object.keys(layer.route.methods))
        out.push({ method: method.toUpperCase(), path: `/api${prefix}${layer.route.path}`.replace(/\/$/, "") });
    }
  }
  return out;
}

/** The path with each `:param` filled in. */
export const fill = (path: string, values: Record<string, string | number>) =>
  path.replace(/:(\w+)/g, (_, name: string) => String(values[name] ?? values.id ?? 1));
