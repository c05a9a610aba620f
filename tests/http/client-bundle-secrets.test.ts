// No server secret reaches the browser: every file Next.js serves to clients from the build that
// `npm test` made (its static folder) is searched for the values of the server-only settings.
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";

const root = join(__dirname, "..", "..");
const SECRETS = ["AUTH_SECRET", "DB_PASSWORD", "STRIPE_SECRET_KEY", "STRIPE_WEBHOOK_SECRET", "RESEND_API_KEY", "UPLOADTHING_API_KEY"];

function files(dir: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) files(p, out);
    else out.push(p);
  }
  return out;
}

describe("client bundle", () => {
  const staticDir = join(root, process.env.NEXT_DIST_DIR ?? ".next-test", "static");

  it("holds none of the server secrets (nor the UploadThing token built from one)", () => {
    const values = SECRETS.map((k) => [k, process.env[k]] as const).filter(([, v]) => v && v.length >= 8);
    expect(values.length).toBe(SECRETS.length);
    const token = Buffer.from(JSON.stringify({ apiKey: process.env.UPLOADTHING_API_KEY })).toString("base64").slice(0, 24);
    const all = files(staticDir);
    expect(all.filter((f) => f.endsWith(".js")).length).toBeGreaterThan(10);
    const leaks: string[] = [];
    for (const f of all) {
      const text = readFileSync(f, "latin1");
      for (const [k, v] of values) if (text.includes(v!)) leaks.push(`${k} in ${f}`);
      if (text.includes(token)) leaks.push(`UploadThing token in ${f}`);
    }
    expect(leaks).toEqual([]);
  });
});
