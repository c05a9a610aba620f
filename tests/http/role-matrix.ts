// A role × route table as Vitest cases: 401 signed out, 404 (the same body as an unknown
// workshop) for a member of another workshop, 403 with the exact body for a role without the
// permission, and the route's own success status for the roles that hold it.
import { describe, expect, it } from "vitest";
import type { Role } from "@/lib/auth/permissions";
import type { HttpSession } from "./session";

export type MatrixWho = Role | "outsider" | "anonymous";

export interface MatrixRoute {
  name: string;
  method: string;
  path: () => string;
  body?: () => unknown;
  allowed: Role[];
  ok: number;
}

/**
 * Describes every route for every role. The role cases run in the order owner, builder,
 * bookkeeper, client, so a permitted change (the owner's) happens once and the refusals after it
 * show the permission is checked first. `slug()` is the workshop in the paths (replaced by an
 * unknown one for the 404 comparison); `as(who)` the signed-in session of each.
 */
export function describeRoleMatrix(title: string, routes: MatrixRoute[], ctx: { slug: () => string; as: (who: MatrixWho) => HttpSession }): void {
  const call = (who: MatrixWho, r: MatrixRoute, path = r.path()) => {
    const body = r.body?.();
    return ctx.as(who).fetch(path, { method: r.method, ...(body !== undefined ? { json: body } : {}) });
  };
  describe(title, () => {
    for (const r of routes) {
      describe(`${r.method} ${r.name}`, () => {
        it("answers 401 with the error body when signed out", async () => {
          const res = await call("anonymous", r);
          expect(res.status).toBe(401);
          expect(await res.json()).toEqual({ error: { code: "unauthenticated", message: "Sign in to continue." } });
        });

        it("answers 404, as for a workshop that does not exist, to a member of another workshop", async () => {
          const outsider = await call("outsider", r);
          const unknown = await call("owner", r, r.path().replace(ctx.slug(), "no-such-workshop-here"));
          expect(outsider.status).toBe(404);
          expect(unknown.status).toBe(404);
          const [x, y] = [await outsider.json(), await unknown.json()];
          expect(x).toEqual({ error: { code: "not_found", message: "No such workshop." } });
          expect(y).toEqual(x);
        });

        for (const role of ["owner", "builder", "bookkeeper", "client"] as Role[]) {
          const permitted = r.allowed.includes(role);
          it(`${permitted ? "lets" : "refuses"} the ${role}`, async () => {
            const res = await call(role, r);
            if (permitted) {
              expect(res.status).toBe(r.ok);
              expect(res.headers.get("cache-control")).toBe("private, no-store");
            } else {
              expect(res.status).toBe(403);
              expect(await res.json()).toEqual({ error: { code: "forbidden", message: "You do not have permission to do this." } });
            }
          });
        }
      });
    }
  });
}
