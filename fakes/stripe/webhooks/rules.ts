// Test controls on upcoming webhook deliveries. A rule applies to the next `remaining` events of
// its type (null = any; "charge.*" = a family) and is then used up. Several rules may apply at once.
import { invalid } from "../errors";
import { newId } from "../ids";
import { jsonParams, optInt, optString } from "../params";
import type { WebhookRule } from "../types";

export interface RuleEffect {
  copies: number;
  delayMs: number;
  hold: boolean;
  drop: boolean;
  notes: string[];
}

const ACTIONS = ["duplicate", "delay", "drop", "hold"] as const;

/** Reads a rule from an admin JSON body (numbers may come as numbers or strings). */
export function parseRule(body: Record<string, unknown>): WebhookRule {
  const p = jsonParams(body);
  const action = optString(p, "action");
  if (!action || !(ACTIONS as readonly string[]).includes(action)) throw invalid(`action must be one of ${ACTIONS.join(", ")}`, "action");
  return {
    id: newId("whr", 10),
    action: action as WebhookRule["action"],
    event_type: optString(p, "event_type"),
    remaining: optInt(p, "count", "count", 1) ?? 1,
    copies: optInt(p, "copies", "copies", 2) ?? 2,
    delay_ms: optInt(p, "delay_ms", "delay_ms", 0) ?? 1000,
  };
}

function matches(rule: WebhookRule, type: string): boolean {
  if (!rule.event_type) return true;
  if (rule.event_type.endsWith(".*")) return type.startsWith(rule.event_type.slice(0, -1));
  return rule.event_type === type;
}

/** Uses up the rules that match this event type and says what to do with its delivery. */
export function applyRules(rules: WebhookRule[], type: string): RuleEffect {
  const effect: RuleEffect = { copies: 1, delayMs: 0, hold: false, drop: false, notes: [] };
  for (const rule of rules) {
    if (rule.remaining <= 0 || !matches(rule, type)) continue;
    rule.remaining -= 1;
    if (rule.action === "duplicate") effect.copies = Math.max(effect.copies, rule.copies);
    if (rule.action === "delay") effect.delayMs += rule.delay_ms;
    if (rule.action === "hold") effect.hold = true;
    if (rule.action === "drop") effect.drop = true;
    effect.notes.push(`${rule.action} (${rule.id})`);
  }
  for (let i = rules.length - 1; i >= 0; i--) if (rules[i]!.remaining <= 0) rules.splice(i, 1);
  return effect;
}
