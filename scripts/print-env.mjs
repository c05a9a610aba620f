// Prints the project's settings as shell `export` lines (the real environment still wins), so
// shell scripts such as db/mariadb.sh see the same .env.example/.env values as everything else.
import { readEnv } from "./env.mjs";

const quote = (v) => `'${String(v).replace(/'/g, `'\\''`)}'`;
const wanted = process.argv.slice(2);
for (const [k, v] of Object.entries(readEnv())) {
  if (!/^[A-Z_][A-Z0-9_]*$/.test(k)) continue;
  if (wanted.length && !wanted.some((w) => k === w || (w.endsWith("*") && k.startsWith(w.slice(0, -1))))) continue;
  console.log(`export ${k}=${quote(v)}`);
}
