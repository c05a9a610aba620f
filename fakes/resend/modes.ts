// How the fake misbehaves on purpose, for tests and demos. A rule applies to every request, or only
// to requests with a recipient containing `match`, so one test's outage does not slow the others.
export type ModeName = "ok" | "fail" | "reject" | "slow";

export interface ModeRule {
  mode: ModeName;
  /** Substring of a recipient address; absent = every request. */
  match?: string;
  /** HTTP status for "fail" (default 503) or "reject" (default 422). */
  status?: number;
  /** Delay for "slow" (default 3000 ms). */
  delayMs?: number;
  /** How many matching requests the rule still affects; absent = until changed. */
  remaining?: number;
}

export class Modes {
  private rules = new Map<string, ModeRule>();

  constructor(initial?: string) {
    // FAKE_RESEND_MODE=fail|reject|slow starts the fake misbehaving for every request.
    if (initial && initial !== "ok" && ["fail", "reject", "slow"].includes(initial)) this.set({ mode: initial as ModeName });
  }

  set(rule: ModeRule): void {
    const key = rule.match ?? "*";
    if (rule.mode === "ok") this.rules.delete(key);
    else this.rules.set(key, rule);
  }

  clear(): void {
    this.rules.clear();
  }

  list(): ModeRule[] {
    return [...this.rules.values()];
  }

  /** The rule for this request (specific matches before the catch-all), counting it down. */
  take(recipients: string[]): ModeRule | undefined {
    const lower = recipients.map((r) => r.toLowerCase());
    const ordered = [...this.rules.entries()].sort(([a], [b]) => (a === "*" ? 1 : 0) - (b === "*" ? 1 : 0));
    for (const [key, rule] of ordered) {
      if (rule.match && !lower.some((r) => r.includes(rule.match!.toLowerCase()))) continue;
      if (rule.remaining !== undefined) {
        rule.remaining -= 1;
        if (rule.remaining <= 0) this.rules.delete(key);
      }
      return rule;
    }
    return undefined;
  }
}
