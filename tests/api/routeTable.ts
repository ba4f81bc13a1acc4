import type { TestApp } from "@spanwright/api/testing";

type Express = TestApp["app"];

interface Layer {
  route?: { path: string | string[]; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

/**
 * Every route registered on the app, as "METHOD /path", read from Express's router. Nested routers
 * are walked too; the API mounts its router without a prefix, so route paths are full paths.
 */
export function listExpressRoutes(app: Express): string[] {
  const root = (app as unknown as { router: { stack: Layer[] } }).router;
  const found: string[] = [];
  const walk = (stack: Layer[]) => {
    for (const layer of stack) {
      if (layer.route) {
        const paths = Array.isArray(layer.route.path) ? layer.route.path : [layer.route.path];
        for (const method of Object.keys(layer.route.methods).filter((m) => layer.route!.methods[m])) {
          for (const p of paths) found.push(`${method.toUpperCase()} ${p}`);
        }
      } else if (layer.handle?.stack) {
        walk(layer.handle.stack);
      }
    }
  };
  walk(root.stack);
  return found.sort();
}
