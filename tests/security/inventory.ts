// What the app exposes, read from the source tree (never from a list kept by hand): every exported
// HTTP method of every `app/**/route.ts`, and every exported function of every module that starts
// with "use server". The files are parsed with the TypeScript compiler, so every form of export
// counts (`export const GET`, `export async function POST`, `export const { GET, POST } = …`,
// `export { x as DELETE }`); a form it cannot read (`export * from`) is an error, never a skip.
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative, sep } from "node:path";
import ts from "typescript";

export const ROOT = join(__dirname, "..", "..");

export const HTTP_METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"] as const;
export type HttpMethod = (typeof HTTP_METHODS)[number];

export interface FoundRoute {
  /** The table's key: `METHOD /url/[param]`, e.g. `PATCH /api/workshops/[workshop]/cohorts/[cohortId]`. */
  id: string;
  method: HttpMethod;
  /** The URL pattern, route groups removed. */
  pattern: string;
  file: string;
  /** What the handler reads, as the source says: `readJson(req, schema)` / `readQuery(req, schema)`. */
  reads: { body: SchemaRef | null; query: SchemaRef | null };
  /** The authorising wrapper the handler is made with (lib/auth/route-handlers.ts), if any. */
  wrapper: "withWorkshop" | "withUser" | null;
  /**
   * Made by a library (`export const { GET, POST } = handlers`, `createRouteHandler(…)`): what it
   * reads cannot be seen from here, so it is taken to read both its body and its query.
   */
  library: boolean;
  /** Reads the request itself (`req.text()`, `req.arrayBuffer()`, `req.json()`, `req.formData()`, the URL's query). */
  readsRaw: boolean;
}

export interface FoundAction {
  /** The table's key: `<file>#<export>`, e.g. `app/(app)/[workshop]/cohorts/actions.ts#createCohortAction`. */
  id: string;
  file: string;
  exportName: string;
}

/** The schema a handler hands to readJson/readQuery: an identifier and where it was imported from. */
export interface SchemaRef {
  name: string;
  /** Module specifier (`@/lib/schemas/cohort`), or null when the schema is defined in the route file itself. */
  from: string | null;
}

const SKIP_DIRS = new Set(["node_modules", ".git", ".next", ".next-test", ".next-bench", ".data"]);

function walk(dir: string, keep: (file: string) => boolean, out: string[] = []): string[] {
  for (const name of readdirSync(dir).sort()) {
    if (SKIP_DIRS.has(name)) continue;
    const p = join(dir, name);
    if (statSync(p).isDirectory()) walk(p, keep, out);
    else if (keep(p)) out.push(relative(ROOT, p).split(sep).join("/"));
  }
  return out;
}

function parse(file: string): ts.SourceFile {
  return ts.createSourceFile(file, readFileSync(join(ROOT, file), "utf8"), ts.ScriptTarget.Latest, true, file.endsWith("x") ? ts.ScriptKind.TSX : ts.ScriptKind.TS);
}

const hasExport = (n: ts.Node) => ts.canHaveModifiers(n) && (ts.getModifiers(n) ?? []).some((m) => m.kind === ts.SyntaxKind.ExportKeyword);

/** Every name a module exports (default excluded), by reading its top-level statements. */
export function exportedNames(file: string): string[] {
  const src = parse(file);
  const names: string[] = [];
  const bindingNames = (b: ts.BindingName) => {
    if (ts.isIdentifier(b)) names.push(b.text);
    else for (const el of b.elements) if (!ts.isOmittedExpression(el)) bindingNames(el.name);
  };
  for (const st of src.statements) {
    if (ts.isExportDeclaration(st)) {
      if (!st.exportClause) throw new Error(`${file}: "export * from" hides what is exported; export the names one by one`);
      if (ts.isNamedExports(st.exportClause) && !st.isTypeOnly) for (const el of st.exportClause.elements) if (!el.isTypeOnly) names.push(el.name.text);
      continue;
    }
    if (!hasExport(st)) continue;
    if (ts.isVariableStatement(st)) for (const d of st.declarationList.declarations) bindingNames(d.name);
    else if (ts.isFunctionDeclaration(st) && st.name && !(ts.getModifiers(st) ?? []).some((m) => m.kind === ts.SyntaxKind.DefaultKeyword)) names.push(st.name.text);
  }
  return names;
}

/** True when the module's first statement is the "use server" directive. */
function isServerModule(file: string): boolean {
  const first = parse(file).statements[0];
  return !!first && ts.isExpressionStatement(first) && ts.isStringLiteral(first.expression) && first.expression.text === "use server";
}

/** `app/(app)/[workshop]/x/route.ts` → `/[workshop]/x` (route groups and parallel-route slots removed). */
export function urlPattern(appFile: string): string {
  const segments = appFile.split("/").slice(1, -1).filter((s) => !/^\(.*\)$/.test(s) && !s.startsWith("@"));
  return `/${segments.join("/")}`;
}

/** The top-level declaration of each exported name (the node that holds its code). */
function exportedDeclarations(src: ts.SourceFile): Map<string, ts.Node> {
  const out = new Map<string, ts.Node>();
  const locals = new Map<string, ts.Node>();
  for (const st of src.statements) {
    if (ts.isVariableStatement(st)) for (const d of st.declarationList.declarations) if (ts.isIdentifier(d.name)) locals.set(d.name.text, d);
    if (ts.isFunctionDeclaration(st) && st.name) locals.set(st.name.text, st);
  }
  for (const st of src.statements) {
    if (ts.isExportDeclaration(st) && st.exportClause && ts.isNamedExports(st.exportClause)) {
      for (const el of st.exportClause.elements) out.set(el.name.text, locals.get((el.propertyName ?? el.name).text) ?? st);
    } else if (hasExport(st) && ts.isVariableStatement(st)) {
      for (const d of st.declarationList.declarations) {
        if (ts.isIdentifier(d.name)) out.set(d.name.text, d);
        else for (const el of d.name.elements) if (!ts.isOmittedExpression(el) && ts.isIdentifier(el.name)) out.set(el.name.text, d);
      }
    } else if (hasExport(st) && ts.isFunctionDeclaration(st) && st.name) out.set(st.name.text, st);
  }
  return out;
}

/** The schema arguments of readJson(req, X) and readQuery(req, X) in one handler's code. */
function schemaReads(src: ts.SourceFile, handler: ts.Node): FoundRoute["reads"] {
  const imports = new Map<string, string>();
  for (const st of src.statements) {
    if (!ts.isImportDeclaration(st) || !st.importClause?.namedBindings || !ts.isNamedImports(st.importClause.namedBindings)) continue;
    for (const el of st.importClause.namedBindings.elements) imports.set(el.name.text, (st.moduleSpecifier as ts.StringLiteral).text);
  }
  const reads: FoundRoute["reads"] = { body: null, query: null };
  const visit = (n: ts.Node) => {
    if (ts.isCallExpression(n) && ts.isIdentifier(n.expression) && (n.expression.text === "readJson" || n.expression.text === "readQuery")) {
      const arg = n.arguments[1];
      const ref: SchemaRef = arg && ts.isIdentifier(arg) ? { name: arg.text, from: imports.get(arg.text) ?? null } : { name: arg?.getText(src) ?? "?", from: null };
      reads[n.expression.text === "readJson" ? "body" : "query"] = ref;
    }
    ts.forEachChild(n, visit);
  };
  visit(handler);
  return reads;
}

/** Every route handler method of every app/**\/route.ts (also .tsx/.js), in file order. */
export function findRoutes(): FoundRoute[] {
  const files = walk(join(ROOT, "app"), (p) => /[\\/]route\.(ts|tsx|js|mjs)$/.test(p));
  return files.flatMap((file) => {
    const methods = exportedNames(file).filter((n): n is HttpMethod => (HTTP_METHODS as readonly string[]).includes(n));
    if (methods.length === 0) throw new Error(`${file} exports no HTTP method`);
    const pattern = urlPattern(file);
    const src = parse(file);
    const declarations = exportedDeclarations(src);
    return methods.map((method) => {
      const handler = declarations.get(method)!;
      const code = handler.getText(src);
      const wrapper = /\bwithWorkshop\(/.test(code) ? "withWorkshop" : /\bwithUser\(/.test(code) ? "withUser" : null;
      const library = ts.isVariableDeclaration(handler) && (!ts.isIdentifier(handler.name) || (!!handler.initializer && !wrapper && !ts.isArrowFunction(handler.initializer) && !ts.isFunctionExpression(handler.initializer)));
      const readsRaw = /\breq(?:uest)?\.(?:text|json|arrayBuffer|formData)\(|searchParams|new URL\(req/.test(code);
      return { id: `${method} ${pattern}`, method, pattern, file, reads: schemaReads(src, handler), wrapper, library, readsRaw };
    });
  });
}

/** Every exported function of every "use server" module under app/, lib/ and components/. */
export function findActions(): FoundAction[] {
  const files = ["app", "lib", "components"].flatMap((d) => walk(join(ROOT, d), (p) => /\.(ts|tsx|js|mjs)$/.test(p)));
  return files.filter(isServerModule).flatMap((file) => exportedNames(file).map((exportName) => ({ id: `${file}#${exportName}`, file, exportName })));
}

/**
 * Files with a "use server" directive inside a function (an inline action): they have no stable
 * export to put in the table, so the matrix refuses them — move the action into an actions.ts.
 */
export function findInlineActions(): string[] {
  const files = ["app", "components"].flatMap((d) => walk(join(ROOT, d), (p) => /\.(ts|tsx|js|mjs)$/.test(p)));
  return files.filter((file) => {
    if (isServerModule(file)) return false;
    let inline = false;
    const visit = (n: ts.Node) => {
      if (ts.isBlock(n)) {
        const first = n.statements[0];
        if (first && ts.isExpressionStatement(first) && ts.isStringLiteral(first.expression) && first.expression.text === "use server") inline = true;
      }
      if (!inline) ts.forEachChild(n, visit);
    };
    visit(parse(file));
    return inline;
  });
}
