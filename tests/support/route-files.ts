import fs from "node:fs";
import path from "node:path";

// Every route handler on disk under app/api (better-auth's catch-all aside, which has its own
// tests), found by reading the files, so a route added by any later change is walked and
// fuzzed without anyone listing it.

export type Method = "GET" | "POST" | "PATCH" | "PUT" | "DELETE";
export type RouteFile = {
  /** "METHOD /api/v1/projects/[projectId]" as the file system names it */
  key: string;
  method: Method;
  route: string;
  /** the dynamic segments' names, in order */
  params: string[];
  load: () => Promise<Record<string, unknown>>;
};

const API = path.join(process.cwd(), "app", "api");

export function routeFiles(): RouteFile[] {
  const found: RouteFile[] = [];
  const walk = (dir: string) => {
    for (const e of fs.readdirSync(dir, { withFileTypes: true })) {
      const full = path.join(dir, e.name);
      if (e.isDirectory()) {
        if (e.name !== "auth" || dir !== API) walk(full);
      } else if (e.name === "route.ts") {
        const src = fs.readFileSync(full, "utf8");
        const route = "/" + path.relative(path.join(process.cwd(), "app"), path.dirname(full)).split(path.sep).join("/");
        const params = [...route.matchAll(/\[([^\]]+)\]/g)].map((m) => m[1]);
        for (const m of src.matchAll(/export const (GET|POST|PATCH|PUT|DELETE)\b/g)) {
          found.push({ key: `${m[1]} ${route}`, method: m[1] as Method, route, params, load: () => import(/* @vite-ignore */ full) });
        }
      }
    }
  };
  walk(API);
  return found.sort((a, b) => a.key.localeCompare(b.key));
}

// The request path for a route with its parameters filled in.
export const pathFor = (route: string, params: Record<string, string>) => route.replace(/\[([^\]]+)\]/g, (_m, name: string) => encodeURIComponent(params[name] ?? ""));
