// What the parts of the UploadThing fake share.
import type { ServerResponse } from "node:http";
import type { JsonStore } from "../kit/json-store";
import type { UploadthingFakeOptions } from "./options";
import type { FileBytes, FileRecord, UploadthingState } from "./state";

export interface CallbackResult {
  callbackData?: unknown;
  error?: string;
}

/** The app's answers to callbacks (POST /callback-result), matched to the PUT that waits for them. */
export class CallbackResults {
  private early = new Map<string, CallbackResult>();
  private waiting = new Map<string, (r: CallbackResult | null) => void>();

  deliver(key: string, result: CallbackResult): void {
    const w = this.waiting.get(key);
    if (w) {
      this.waiting.delete(key);
      w(result);
    } else this.early.set(key, result);
  }

  wait(key: string, timeoutMs: number): Promise<CallbackResult | null> {
    const got = this.early.get(key);
    if (got) {
      this.early.delete(key);
      return Promise.resolve(got);
    }
    return new Promise((resolve) => {
      const timer = setTimeout(() => {
        this.waiting.delete(key);
        resolve(null);
      }, timeoutMs);
      this.waiting.set(key, (r) => {
        clearTimeout(timer);
        resolve(r);
      });
    });
  }
}

/** Open dev-mode /route-metadata answers: one JSON line per uploaded file, closed when all are in. */
export interface DevStream {
  res: ServerResponse;
  pending: Set<string>;
}

export interface UtContext {
  readonly opts: UploadthingFakeOptions;
  readonly store: JsonStore<UploadthingState>;
  readonly state: UploadthingState;
  readonly bytes: FileBytes;
  readonly results: CallbackResults;
  readonly devStreams: Map<string, DevStream>;
  publicUrl(): string;
  fileUrl(file: FileRecord): string;
  log(message: string): void;
}
