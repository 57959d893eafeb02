import fs from "node:fs";
import path from "node:path";
import type { ActionGuardRow, RouteGuardRow } from "./route-guard-table";

export const projectRoot = path.resolve(__dirname, "../..");
const tableFile = "tests/support/route-guard-table.ts";

function walk(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) return entry.name === "node_modules" || entry.name.startsWith(".") ? [] : walk(full);
    return [full];
  });
}

function relative(file: string): string {
  return path.relative(projectRoot, file).split(path.sep).join("/");
}

const httpMethods = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"];

/** Every route handler file under app/api with the HTTP methods it exports. */
export function routeFiles(): { file: string; methods: string[] }[] {
  return walk(path.join(projectRoot, "app/api"))
    .filter((file) => /\/route\.(ts|tsx|js)$/.test(file))
    .map((file) => {
      const source = fs.readFileSync(file, "utf8");
      const methods = new Set<string>();
      for (const match of source.matchAll(/export\s+(?:const|let|async\s+function|function)\s+([A-Z]+)\b/g)) methods.add(match[1]!);
      for (const match of source.matchAll(/\bas\s+([A-Z]+)\b/g)) methods.add(match[1]!);
      return { file: relative(file), methods: [...methods].filter((method) => httpMethods.includes(method)).sort() };
    })
    .sort((a, b) => a.file.localeCompare(b.file));
}

/** Every server-action module under app/ and lib/ (first statement "use server") with its exported functions. */
export function actionFiles(): { file: string; actions: string[] }[] {
  return ["app", "lib"]
    .flatMap((dir) => walk(path.join(projectRoot, dir)))
    .filter((file) => /\.(ts|tsx)$/.test(file))
    .filter((file) => /^(\s|\/\/[^\n]*\n|\/\*[\s\S]*?\*\/)*["']use server["']/.test(fs.readFileSync(file, "utf8")))
    .map((file) => {
      const source = fs.readFileSync(file, "utf8");
      const actions = [...source.matchAll(/export\s+(?:async\s+function|const|function)\s+(\w+)/g)].map((match) => match[1]!);
      return { file: relative(file), actions: actions.sort() };
    })
    .sort((a, b) => a.file.localeCompare(b.file));
}

/** One message per handler or action without a row, and per row whose handler no longer exists. */
export function missingGuardRows(
  routes: RouteGuardRow[],
  actions: ActionGuardRow[],
  found = { routes: routeFiles(), actions: actionFiles() },
): string[] {
  const messages: string[] = [];
  for (const { file, methods } of found.routes) {
    if (methods.length === 0) messages.push(`${file} exports no HTTP method this walker recognises; export GET/POST/… by name.`);
    for (const method of methods) {
      if (!routes.some((row) => row.file === file && row.method === method)) {
        messages.push(`${file} exports ${method} but ${tableFile} has no row for it: add its expected status for every role.`);
      }
    }
  }
  for (const { file, actions: names } of found.actions) {
    for (const name of names) {
      if (!actions.some((row) => row.file === file && row.action === name)) {
        messages.push(
          `${file} exports the server action ${name} but ${tableFile} has no row for it: add its expected status for every role.`,
        );
      }
    }
  }
  for (const row of routes) {
    if (!found.routes.some((route) => route.file === row.file && route.methods.includes(row.method))) {
      messages.push(`${tableFile} has a row for ${row.method} ${row.file}, which does not exist any more.`);
    }
  }
  for (const row of actions) {
    if (!found.actions.some((entry) => entry.file === row.file && entry.actions.includes(row.action))) {
      messages.push(`${tableFile} has a row for the action ${row.action} in ${row.file}, which does not exist any more.`);
    }
  }
  return messages;
}

/** The route parameters a request path gives a route file ([id], [...slug], [[...slug]]); throws when they do not match. */
export function paramsFor(file: string, requestPath: string): Record<string, string | string[]> {
  const pattern = file
    .replace(/^app\//, "")
    .replace(/\/route\.(ts|tsx|js)$/, "")
    .split("/")
    .filter((segment) => !/^\(.*\)$/.test(segment));
  const parts = new URL(requestPath, "http://x").pathname.split("/").filter(Boolean);
  const params: Record<string, string | string[]> = {};
  for (let index = 0; index < pattern.length; index += 1) {
    const segment = pattern[index]!;
    const catchAll = /^\[\[?\.\.\.(\w+)\]\]?$/.exec(segment);
    if (catchAll) {
      params[catchAll[1]!] = parts.slice(index).map(decodeURIComponent);
      return params;
    }
    const part = parts[index];
    const dynamic = /^\[(\w+)\]$/.exec(segment);
    if (dynamic && part !== undefined) params[dynamic[1]!] = decodeURIComponent(part);
    else if (part !== segment) throw new Error(`Row path ${requestPath} does not match ${file}`);
  }
  if (parts.length !== pattern.length) throw new Error(`Row path ${requestPath} does not match ${file}`);
  return params;
}
