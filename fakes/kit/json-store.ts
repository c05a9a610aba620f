// A JSON state file for a fake, written atomically (temp file + rename) so a crash or Ctrl-C never
// leaves half a file behind, and debounced so a burst of changes is one write.
import { existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from "node:fs";
import { dirname } from "node:path";

export interface JsonStore<T> {
  /** The live state; mutate it, then call `changed()`. */
  readonly state: T;
  changed(): void;
  /** Writes now (used on shutdown and by tests that restart a fake). */
  flush(): void;
  /** Replaces the state with a fresh one and writes it. */
  reset(): void;
}

export function openJsonStore<T extends object>(file: string | null, fresh: () => T): JsonStore<T> {
  let state: T = fresh();
  if (file && existsSync(file)) {
    try {
      state = { ...fresh(), ...(JSON.parse(readFileSync(file, "utf8")) as Partial<T>) };
    } catch (err) {
      console.error(`[fake] could not read ${file}, starting empty:`, err);
    }
  }
  let timer: NodeJS.Timeout | null = null;
  const flush = () => {
    if (timer) clearTimeout(timer);
    timer = null;
    if (!file) return;
    mkdirSync(dirname(file), { recursive: true });
    const tmp = `${file}.${process.pid}.tmp`;
    writeFileSync(tmp, JSON.stringify(state));
    renameSync(tmp, file);
  };
  return {
    get state() {
      return state;
    },
    changed() {
      if (!timer) timer = setTimeout(flush, 25);
    },
    flush,
    reset() {
      state = fresh();
      flush();
    },
  };
}
