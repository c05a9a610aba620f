// What the fake provider remembers: accepted messages and idempotency keys, in one JSON file under
// FAKES_DATA_DIR so the inbox survives a restart. Small by design: the newest 2000 messages.
import { mkdirSync, readFileSync, renameSync, writeFileSync, existsSync } from "node:fs";
import { join } from "node:path";

export interface StoredMessage {
  id: string;
  from: string;
  to: string[];
  cc: string[];
  bcc: string[];
  replyTo: string[];
  subject: string;
  html: string | null;
  text: string | null;
  headers: Record<string, string>;
  tags: Array<{ name: string; value: string }>;
  idempotencyKey: string | null;
  createdAt: string;
}

interface IdempotencyRecord {
  fingerprint: string;
  ids: string[];
  batch: boolean;
  at: string;
}

interface State {
  messages: StoredMessage[];
  idempotency: Record<string, IdempotencyRecord>;
}

const MAX_MESSAGES = 2000;
// The hosted service keeps keys for 24 hours; so do we.
const KEY_TTL_MS = 24 * 60 * 60 * 1000;

export class Store {
  private state: State = { messages: [], idempotency: {} };
  private readonly file: string;

  constructor(dir: string) {
    mkdirSync(dir, { recursive: true });
    this.file = join(dir, "resend-state.json");
    if (existsSync(this.file)) {
      try {
        this.state = JSON.parse(readFileSync(this.file, "utf8")) as State;
      } catch {
        console.error(`[fake resend] ${this.file} is unreadable; starting empty`);
      }
    }
  }

  private save(): void {
    const now = Date.now();
    for (const [k, v] of Object.entries(this.state.idempotency)) if (now - Date.parse(v.at) > KEY_TTL_MS) delete this.state.idempotency[k];
    if (this.state.messages.length > MAX_MESSAGES) this.state.messages = this.state.messages.slice(-MAX_MESSAGES);
    const tmp = `${this.file}.${process.pid}.tmp`;
    writeFileSync(tmp, JSON.stringify(this.state));
    renameSync(tmp, this.file);
  }

  idempotent(key: string): IdempotencyRecord | undefined {
    return this.state.idempotency[key];
  }

  add(messages: StoredMessage[], key: string | null, fingerprint: string, batch: boolean): void {
    this.state.messages.push(...messages);
    if (key) this.state.idempotency[key] = { fingerprint, ids: messages.map((m) => m.id), batch, at: new Date().toISOString() };
    this.save();
  }

  get(id: string): StoredMessage | undefined {
    return this.state.messages.find((m) => m.id === id);
  }

  /** Newest first; `to` matches any recipient exactly (case-insensitive). */
  list(filter: { to?: string; since?: string; limit?: number } = {}): StoredMessage[] {
    const to = filter.to?.toLowerCase();
    const since = filter.since ? Date.parse(filter.since) : undefined;
    const out: StoredMessage[] = [];
    for (let i = this.state.messages.length - 1; i >= 0 && out.length < (filter.limit ?? 500); i--) {
      const m = this.state.messages[i]!;
      if (to && !m.to.some((r) => r.toLowerCase() === to)) continue;
      if (since !== undefined && Date.parse(m.createdAt) < since) continue;
      out.push(m);
    }
    return out;
  }

  clear(): void {
    this.state = { messages: [], idempotency: {} };
    this.save();
  }
}
