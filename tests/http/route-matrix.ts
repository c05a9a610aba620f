// What every role × route table checks the same way: a route answered signed out (401), and by a
// member of another workshop (404, the same answer as for a workshop that does not exist).
import { expect, it } from "vitest";
import type { HttpSession } from "./session";

export interface MatrixRoute {
  method: string;
  path: () => string;
  body?: () => unknown;
}

/** Sends the route's request as this session (to another path, if given). */
export async function callRoute(s: HttpSession, r: MatrixRoute, path = r.path()): Promise<Response> {
  const body = r.body?.();
  return s.fetch(path, { method: r.method, ...(body !== undefined ? { json: body } : {}) });
}

/** The 401 and the other-workshop 404 tests of one route of the workshop `slug()`. */
export function itRefusesStrangers(r: MatrixRoute, who: { anonymous: () => HttpSession; outsider: () => HttpSession; member: () => HttpSession; slug: () => string }) {
  it("answers 401 with the error body when signed out", async () => {
    const res = await callRoute(who.anonymous(), r);
    expect(res.status).toBe(401);
    expect(await res.json()).toEqual({ error: { code: "unauthenticated", message: "Sign in to continue." } });
  });

  it("answers 404, as for a workshop that does not exist, to a member of another workshop", async () => {
    const outsider = await callRoute(who.outsider(), r);
    const unknown = await callRoute(who.member(), r, r.path().replace(who.slug(), "no-such-workshop-here"));
    expect(outsider.status).toBe(404);
    expect(unknown.status).toBe(404);
    const [x, y] = [await outsider.json(), await unknown.json()];
    expect(x).toEqual({ error: { code: "not_found", message: "No such workshop." } });
    expect(y).toEqual(x);
  });
}
