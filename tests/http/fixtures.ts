// Workshops and people in the test database, made directly (fast, and independent of the routes
// under test). Every name is unique per call, so test files can run in parallel.
import { randomBytes } from "node:crypto";
import { hashPassword } from "../../lib/auth/password";
import type { Role } from "../../lib/auth/permissions";
import { testDb } from "../setup/test-db";

export const TEST_PASSWORD = "test-password-2027";

export interface TestPerson {
  userId: number;
  email: string;
  name: string;
  password: string;
}

export interface TestMember extends TestPerson {
  membershipId: number;
  role: Role;
}

export interface TestWorkshop {
  id: number;
  slug: string;
  name: string;
  members: TestMember[];
  owner: TestMember;
  builder: TestMember;
  bookkeeper: TestMember;
  client: TestMember;
}

let hashed: Promise<string> | undefined;
const passwordHash = () => (hashed ??= hashPassword(TEST_PASSWORD));

export const uid = () => randomBytes(4).toString("hex");

/** A unique address at example.com, e.g. `owner-1a2b3c4d@example.com`. */
export function uniqueEmail(prefix = "person"): string {
  return `${prefix}-${uid()}@example.com`;
}

/** An account with the test password (or none, for a sign-in-by-link-only person). */
export async function createTestUser(opts: { email?: string; name?: string; withPassword?: boolean } = {}): Promise<TestPerson> {
  const email = (opts.email ?? uniqueEmail()).toLowerCase();
  const name = opts.name ?? `Test ${email.split("@")[0]}`;
  const [id] = await testDb()("users").insert({
    email,
    name,
    password_hash: opts.withPassword === false ? null : await passwordHash(),
    email_verified_at: new Date(),
  });
  return { userId: Number(id), email, name, password: TEST_PASSWORD };
}

export async function addMember(workshopId: number, person: TestPerson, role: Role): Promise<TestMember> {
  const [id] = await testDb()("memberships").insert({ workshop_id: workshopId, user_id: person.userId, role });
  return { ...person, membershipId: Number(id), role };
}

/** A workshop with one owner, builder, bookkeeper and client (more with `extra`). */
export async function createWorkshopWithMembers(opts: { name?: string; extra?: Partial<Record<Role, number>> } = {}): Promise<TestWorkshop> {
  const tag = uid();
  const slug = `ws-${tag}`;
  const name = opts.name ?? `Test Workshop ${tag}`;
  const [id] = await testDb()("workshops").insert({ slug, name, unit_preference: "mm", currency: "EUR" });
  const workshopId = Number(id);
  const members: TestMember[] = [];
  const counts: Record<Role, number> = { owner: 1, builder: 1, bookkeeper: 1, client: 1 };
  for (const [role, n] of Object.entries(opts.extra ?? {})) counts[role as Role] += n ?? 0;
  for (const role of ["owner", "builder", "bookkeeper", "client"] as Role[]) {
    for (let i = 0; i < counts[role]; i++) members.push(await addMember(workshopId, await createTestUser({ email: uniqueEmail(role) }), role));
  }
  const first = (r: Role) => members.find((m) => m.role === r)!;
  return { id: workshopId, slug, name, members, owner: first("owner"), builder: first("builder"), bookkeeper: first("bookkeeper"), client: first("client") };
}
