// What the UploadThing fake keeps: file records (bytes live in files/<key>) and the route
// metadata the app registered for upcoming uploads.
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync, appendFileSync } from "node:fs";
import { join } from "node:path";
import { openJsonStore, type JsonStore } from "../kit/json-store";

export type FileStatus = "Uploading" | "Uploaded" | "Failed" | "Deletion Pending";

export interface FileRecord {
  id: string;
  key: string;
  name: string;
  size: number;
  type: string;
  customId: string | null;
  acl: "public-read" | "private";
  contentDisposition: "inline" | "attachment";
  slug: string | null;
  status: FileStatus;
  received: number;
  fileHash: string | null;
  uploadedAt: number;
  lastModified: number;
  serverData: unknown;
}

export interface Registration {
  id: string;
  fileKeys: string[];
  metadata: unknown;
  isDev: boolean;
  callbackUrl: string;
  callbackSlug: string;
  awaitServerData: boolean;
  created: number;
}

export interface CallbackLog {
  at: string;
  key: string;
  url: string;
  status: number | null;
  error: string | null;
}

export interface UploadthingState {
  files: Record<string, FileRecord>;
  registrations: Record<string, Registration>;
  /** file key → registration id */
  registered: Record<string, string>;
  callbacks: CallbackLog[];
}

const fresh = (): UploadthingState => ({ files: {}, registrations: {}, registered: {}, callbacks: [] });

/** File bytes on disk (or in memory for tests), beside the JSON state. */
export class FileBytes {
  private memory = new Map<string, Buffer>();
  constructor(private readonly dir: string | null) {
    if (dir) mkdirSync(dir, { recursive: true });
  }
  private path(key: string) {
    return join(this.dir!, key.replace(/[^A-Za-z0-9_-]/g, "_"));
  }
  write(key: string, bytes: Buffer, append: boolean): void {
    if (!this.dir) {
      this.memory.set(key, append ? Buffer.concat([this.memory.get(key) ?? Buffer.alloc(0), bytes]) : bytes);
    } else if (append) appendFileSync(this.path(key), bytes);
    else writeFileSync(this.path(key), bytes);
  }
  read(key: string): Buffer | null {
    if (!this.dir) return this.memory.get(key) ?? null;
    return existsSync(this.path(key)) ? readFileSync(this.path(key)) : null;
  }
  remove(key: string): void {
    if (!this.dir) this.memory.delete(key);
    else rmSync(this.path(key), { force: true });
  }
  clear(): void {
    this.memory.clear();
    if (this.dir) {
      rmSync(this.dir, { recursive: true, force: true });
      mkdirSync(this.dir, { recursive: true });
    }
  }
}

export function openState(dataDir: string | null): { store: JsonStore<UploadthingState>; bytes: FileBytes } {
  return {
    store: openJsonStore(dataDir ? join(dataDir, "state.json") : null, fresh),
    bytes: new FileBytes(dataDir ? join(dataDir, "files") : null),
  };
}
