// Photo test helpers: the real upload client (uploadthing/client, as @uploadthing/react uses it)
// against the app `npm test` serves and the uploads fake it started; commissions in a build stage.
import { genUploader } from "uploadthing/client";
import type { PhotoFileRouter } from "@/lib/photos/file-router";
import type { PhotoUploadResult } from "@/lib/schemas/photo";
import type { LogoUploadResult } from "@/lib/schemas/workshop-logo";
import { FetchXMLHttpRequest } from "../fakes/helpers/xhr-over-fetch";
import { testDb } from "../setup/test-db";
import { appUrl } from "./app-url";
import { approveSpec, base, openCommission } from "./commission-helpers";
import type { TestWorkshop } from "./fixtures";
import type { HttpSession } from "./session";

/** Node has no XMLHttpRequest, which the upload client uses for the PUT: send the same request with fetch. */
export function installXhr(): void {
  (globalThis as { XMLHttpRequest?: unknown }).XMLHttpRequest = FetchXMLHttpRequest;
}

export const cookieHeader = (s: HttpSession) => [...s.cookies].map(([k, v]) => `${k}=${v}`).join("; ");

const uploader = () => genUploader<PhotoFileRouter>({ url: appUrl("/api/uploadthing"), package: "@uploadthing/react", fetch: globalThis.fetch });

export interface UploadedPhoto {
  key: string;
  name: string;
  serverData: PhotoUploadResult;
}

/** Uploads files as `s` through the photo route (throws the client's UploadThingError when refused). */
export async function uploadPhotos(s: HttpSession, ws: TestWorkshop, commissionId: number, files: File[], caption = "Test photo"): Promise<UploadedPhoto[]> {
  const res = await uploader().uploadFiles("stagePhoto", {
    files,
    input: { workshop: ws.slug, commissionId, caption },
    headers: { cookie: cookieHeader(s) },
  });
  return res.map((r) => ({ key: r.key, name: r.name, serverData: r.serverData as PhotoUploadResult }));
}

/** Uploads one photo that must be accepted; its photo id. */
export async function addPhoto(s: HttpSession, ws: TestWorkshop, commissionId: number, file: File, caption = "Test photo"): Promise<number> {
  const [up] = await uploadPhotos(s, ws, commissionId, [file], caption);
  if (!up?.serverData.ok) throw new Error(`upload refused: ${JSON.stringify(up?.serverData)}`);
  return up.serverData.photoId;
}

/** Uploads a workshop logo as `s` through the logo route (throws the client's UploadThingError when refused). */
export async function uploadLogo(s: HttpSession, slug: string, file: File): Promise<{ key: string; serverData: LogoUploadResult }> {
  const [r] = await uploader().uploadFiles("workshopLogo", { files: [file], input: { workshop: slug }, headers: { cookie: cookieHeader(s) } });
  return { key: r!.key, serverData: r!.serverData as LogoUploadResult };
}

/** The route's first request (upload URLs) sent by hand, to see the status and body the SDK answers. */
export async function askToUpload(
  s: HttpSession | null,
  input: unknown,
  files: Array<{ name: string; size: number; type: string }>,
  route: "stagePhoto" | "workshopLogo" = "stagePhoto",
): Promise<{ status: number; body: any }> {
  const res = await fetch(appUrl(`/api/uploadthing?actionType=upload&slug=${route}`), {
    method: "POST",
    headers: { "content-type": "application/json", "x-uploadthing-version": "7.7.4", ...(s ? { cookie: cookieHeader(s) } : {}) },
    body: JSON.stringify({ input, files: files.map((f) => ({ ...f, lastModified: Date.now() })) }),
  });
  return { status: res.status, body: await res.json() };
}

export const fileOf = (bytes: Buffer, name: string, type = "image/jpeg") => new File([new Uint8Array(bytes)], name, { type });

/** The uploads fake `npm test` started (admin endpoints, plain file URLs). */
export const fakeUrl = (path: string) => `http://127.0.0.1:${process.env.FAKE_UPLOADTHING_PORT}${path}`;

export interface FakeFile {
  key: string;
  name: string;
  acl: string;
  status: string;
  type: string;
}

export async function fakeFiles(): Promise<FakeFile[]> {
  return ((await (await fetch(fakeUrl("/admin/files"))).json()) as { data: FakeFile[] }).data;
}

export async function setFakeOutage(mode: "unavailable" | "refuse" | "none", seconds?: number): Promise<void> {
  const res = await fetch(fakeUrl("/admin/outage"), { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ mode, seconds }) });
  if (!res.ok) throw new Error(`outage ${mode}: ${res.status}`);
}

export interface PhotoRowInDb {
  id: number;
  commission_id: number;
  stage: string;
  caption: string;
  uploaded_by: number;
  source_key: string;
  file_key: string;
  thumb_key: string;
  width: number;
  height: number;
  thumb_width: number;
  thumb_height: number;
  removed_at: Date | null;
}

export async function photoRow(id: number): Promise<PhotoRowInDb> {
  return testDb()("photos").where({ id }).first();
}

/** A commission whose deposit is recorded: at the workshop's first build stage ("timber"). */
export async function commissionInBuild(ws: TestWorkshop, people: { owner: HttpSession; builder: HttpSession; client: HttpSession; bookkeeper: HttpSession }, extra: Record<string, unknown> = {}) {
  const c = await openCommission(people.owner, ws, extra);
  await approveSpec(people.builder, people.client, ws, c.id);
  const paid = await people.bookkeeper.fetch(`${base(ws)}/${c.id}/payments`, { method: "POST", json: { kind: "deposit", amountMinor: 90_000, reference: "Bank transfer" } });
  if (paid.status !== 201) throw new Error(`deposit failed ${paid.status} ${await paid.text()}`);
  return c;
}

export const photosPath = (ws: TestWorkshop, commissionId: number) => `${base(ws)}/${commissionId}/photos`;
