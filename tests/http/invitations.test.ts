// Invitations end to end over HTTP: the e-mail arrives at the fake through the real Resend SDK,
// its link works once, for the invited address, for 7 days; revoked and expired links do not.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "../setup/test-db";
import { createTestUser, createWorkshopWithMembers, uniqueEmail, type TestWorkshop } from "./fixtures";
import { linkIn, waitForEmail } from "./inbox";
import { anonymous, signIn, type HttpSession } from "./session";

let ws: TestWorkshop;
let owner: HttpSession;

beforeAll(async () => {
  ws = await createWorkshopWithMembers();
  owner = await signIn(ws.owner);
});
afterAll(closeTestDb);

async function invite(email: string, role = "builder") {
  const r = await owner.json<{ invitation: { id: number; email: string; role: string; state: string; expiresAt: string } }>(`/api/workshops/${ws.slug}/invitations`, {
    json: { email, role },
  });
  expect(r.status).toBe(201);
  return r.body.invitation;
}

const tokenOf = (link: string) => link.split("/invitations/")[1]!;

describe("invitations", () => {
  it("e-mails a link that expires in 7 days and lists the invitation as pending", async () => {
    const email = uniqueEmail("invitee");
    const inv = await invite(email.toUpperCase(), "bookkeeper");
    expect(inv).toMatchObject({ email, role: "bookkeeper", state: "pending" });
    // 7 days, give or take the request's own duration.
    expect(Date.parse(inv.expiresAt) - Date.now()).toBeGreaterThan(7 * 86_400_000 - 60_000);
    expect(Date.parse(inv.expiresAt) - Date.now()).toBeLessThanOrEqual(7 * 86_400_000);
    const mail = await waitForEmail(email);
    expect(mail.subject).toBe(`${ws.owner.name} invited you to ${ws.name} on Scalewright`);
    expect(mail.html).toContain(ws.name);
    expect(mail.text).toContain("as bookkeeper");
    expect(linkIn(mail, "/invitations/")).toMatch(new RegExp(`^${process.env.TEST_APP_URL}/invitations/[A-Za-z0-9_-]{43}$`));
    const list = await owner.json<{ invitations: Array<{ id: number; state: string }> }>(`/api/workshops/${ws.slug}/invitations`);
    expect(list.body.invitations.find((i) => i.id === inv.id)?.state).toBe("pending");
  });

  it("works once: the invited person joins with the role, a second use is refused", async () => {
    const person = await createTestUser({ email: uniqueEmail("joiner") });
    await invite(person.email, "builder");
    const token = tokenOf(linkIn(await waitForEmail(person.email), "/invitations/"));
    const s = await signIn(person);
    const first = await s.json<{ workshop: { slug: string } }>("/api/invitations/accept", { json: { token } });
    expect(first).toEqual({ status: 200, body: { workshop: { slug: ws.slug } } });
    const m = await testDb()("memberships").where({ workshop_id: ws.id, user_id: person.userId }).first("role");
    expect(m.role).toBe("builder");
    const second = await s.json("/api/invitations/accept", { json: { token } });
    expect(second).toEqual({ status: 409, body: { error: { code: "conflict", message: "This invitation has already been used." } } });
  });

  it("refuses a link after 7 days", async () => {
    const person = await createTestUser({ email: uniqueEmail("late") });
    const inv = await invite(person.email);
    const token = tokenOf(linkIn(await waitForEmail(person.email), "/invitations/"));
    // Eight days later, as far as the row is concerned.
    await testDb()("invitations").where({ id: inv.id }).update({ expires_at: new Date(Date.now() - 86_400_000), created_at: new Date(Date.now() - 8 * 86_400_000) });
    const r = await (await signIn(person)).json("/api/invitations/accept", { json: { token } });
    expect(r).toEqual({ status: 409, body: { error: { code: "conflict", message: "This invitation has expired. Ask the workshop's owner for a new one." } } });
    expect(await testDb()("memberships").where({ workshop_id: ws.id, user_id: person.userId }).first("id")).toBeUndefined();
  });

  it("refuses a revoked link, and re-inviting replaces the earlier link", async () => {
    const person = await createTestUser({ email: uniqueEmail("revoked") });
    const first = await invite(person.email);
    const oldToken = tokenOf(linkIn(await waitForEmail(person.email), "/invitations/"));
    await invite(person.email, "client");
    const mails = await waitForEmail(person.email, { count: 2 });
    const newToken = tokenOf(linkIn(mails, "/invitations/"));
    expect(newToken).not.toBe(oldToken);
    const s = await signIn(person);
    expect((await s.json("/api/invitations/accept", { json: { token: oldToken } })).status).toBe(409);
    const revoke = await owner.json<{ invitation: { state: string } }>(`/api/workshops/${ws.slug}/invitations/${first.id}`, { method: "DELETE" });
    expect(revoke.body.invitation.state).toBe("revoked");
    expect((await s.json("/api/invitations/accept", { json: { token: newToken } })).status).toBe(200);
    expect((await testDb()("memberships").where({ workshop_id: ws.id, user_id: person.userId }).first("role")).role).toBe("client");
  });

  it("only works for the invited address", async () => {
    const email = uniqueEmail("intended");
    await invite(email);
    const token = tokenOf(linkIn(await waitForEmail(email), "/invitations/"));
    const other = await signIn(await createTestUser({ email: uniqueEmail("other") }));
    const r = await other.json<{ error: { code: string } }>("/api/invitations/accept", { json: { token } });
    expect(r.status).toBe(403);
  });

  it("answers 401 to accepting while signed out, and 404 to an unknown token", async () => {
    const s = await signIn(await createTestUser());
    expect((await s.fetch("/api/invitations/accept", { json: { token: "x".repeat(43) } })).status).toBe(404);
    expect((await anonymous().fetch("/api/invitations/accept", { json: { token: "x".repeat(43) } })).status).toBe(401);
  });

  it("refuses to invite someone who is already a member, with the field path", async () => {
    const r = await owner.json(`/api/workshops/${ws.slug}/invitations`, { json: { email: ws.client.email, role: "builder" } });
    expect(r).toEqual({
      status: 409,
      body: { error: { code: "conflict", message: "This person is already a member.", issues: [{ path: "email", message: "Already a member of this workshop." }] } },
    });
  });

  it("shows the accept page for a pending link and 404 for an unknown one", async () => {
    const email = uniqueEmail("page");
    await invite(email, "client");
    const link = linkIn(await waitForEmail(email), "/invitations/");
    const page = await anonymous().fetch(link);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain(`Join ${ws.name}`);
    expect(html).toContain("Accept and join");
    expect((await anonymous().fetch("/invitations/" + "y".repeat(43))).status).toBe(404);
  });
});
