// What every answer must look like, whoever asked and whatever they sent: no stack trace, no SQL
// or driver text, and our one error shape (`{ error: { code, message, issues? } }`, the code
// matching the status; 422 with a field path on every issue). Used by the matrix and the fuzzing.
import { ERROR_STATUS, type ErrorCode } from "@/lib/http/errors";

/** Text that only an internal error would put in a response: stack frames, file paths, SQL, driver codes. */
const LEAKS: Array<[string, RegExp]> = [
  ["a stack frame", /\bat (?:async )?[\w.$<>]+ \(?(?:\/|file:|node:|webpack|\[)/],
  ["a source path", /(?:\/work\/|node_modules\/|\.next(?:-test)?\/server|\.(?:ts|js|mjs):\d+:\d+)/],
  ["an SQL error", /\b(?:ER_[A-Z_]{4,}|SQLSTATE|sqlMessage|You have an error in your SQL syntax|Incorrect (?:integer|decimal|date|datetime) value|Data truncated for column|Out of range value for column)\b/],
  ["an SQL statement", /\b(?:select [`\w*., ]+ from `|insert into `|update `\w+` set|delete from `)/i],
  ["a JavaScript error name", /\b(?:TypeError|ReferenceError|RangeError|SyntaxError): /],
];

/** The leaks found in a response body (empty when it is clean). */
export function leaksIn(text: string): string[] {
  return LEAKS.filter(([, re]) => re.test(text)).map(([what]) => what);
}

const CODE_FOR_STATUS = Object.fromEntries(Object.entries(ERROR_STATUS).map(([code, status]) => [status, code])) as Record<number, ErrorCode>;

/** The error code our mapper gives a status (unauthenticated for 401, …). */
export const codeFor = (status: number): ErrorCode | undefined => CODE_FOR_STATUS[status];

interface ErrorBodyShape {
  error?: { code?: unknown; message?: unknown; issues?: unknown };
}

/** Problems with an error body of our own routes: shape, code for the status, issues with paths on a 422. */
export function errorBodyProblems(status: number, body: unknown): string[] {
  const problems: string[] = [];
  const e = (body as ErrorBodyShape | null)?.error;
  if (!e || typeof e !== "object") return [`${status} without an { error } body: ${JSON.stringify(body)?.slice(0, 200)}`];
  if (e.code !== codeFor(status)) problems.push(`${status} with code ${String(e.code)} (expected ${codeFor(status)})`);
  if (typeof e.message !== "string" || e.message.length < 3) problems.push(`${status} without a message a person can read`);
  if (status === 422) {
    const issues = e.issues;
    if (!Array.isArray(issues) || issues.length === 0) problems.push("422 without issues");
    else for (const i of issues as Array<{ path?: unknown; message?: unknown }>) if (typeof i?.path !== "string" || typeof i?.message !== "string") problems.push(`422 issue without a path and message: ${JSON.stringify(i)}`);
  }
  return problems;
}
