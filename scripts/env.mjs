// Loads settings for every script and server: .env.example (defaults), then .env, then the real
// environment wins. Plain JavaScript with no dependencies, so it runs before `npm ci`.
import { existsSync, readFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { parseEnv } from "node:util";

export const ROOT = join(dirname(fileURLToPath(import.meta.url)), "..");

/** Returns the merged settings without touching process.env. */
export function readEnv(base = process.env) {
  const merged = {};
  for (const file of [".env.example", ".env"]) {
    const path = join(ROOT, file);
    if (existsSync(path)) Object.assign(merged, parseEnv(readFileSync(path, "utf8")));
  }
  for (const [k, v] of Object.entries(base)) if (v !== undefined) merged[k] = v;
  return merged;
}

/** Fills process.env with the defaults it lacks. */
export function loadEnv() {
  const merged = readEnv();
  for (const [k, v] of Object.entries(merged)) if (process.env[k] === undefined) process.env[k] = v;
  return merged;
}
