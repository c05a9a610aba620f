// The setup sheet's checks: impossible values (refused on save) and values outside the workshop's
// common-practice ranges (saved, shown as warnings).
import { Badge } from "@/components/ui/badge";
import type { SetupIssue } from "@/lib/setup/checks";

export function SetupChecks({ issues, idPrefix }: { issues: SetupIssue[]; idPrefix?: string }) {
  const errors = issues.filter((i) => i.level === "error");
  const warnings = issues.filter((i) => i.level === "warning");
  if (!issues.length) {
    return (
      <p className="text-sm text-moss-700" role="status">
        Every value is inside the workshop&apos;s common-practice ranges.
      </p>
    );
  }
  const row = (i: SetupIssue, k: number) => (
    <li key={`${i.path}-${k}`} className="flex items-start gap-2 text-sm">
      <Badge tone={i.level === "error" ? "danger" : "warning"}>{i.level === "error" ? "cannot be right" : "check"}</Badge>
      {idPrefix && i.path ? (
        <a href={`#${idPrefix}-${i.path.replace(/\./g, "-")}`} className="flex-1 underline-offset-2 hover:underline">
          {i.message}
        </a>
      ) : (
        <span className="flex-1">{i.message}</span>
      )}
    </li>
  );
  return (
    <div className="space-y-3" aria-live="polite">
      {errors.length ? (
        <section aria-label="Impossible values">
          <p className="mb-1 text-xs font-semibold uppercase tracking-wider text-ember-700">Impossible values: fix these to save</p>
          <ul className="space-y-1">{errors.map(row)}</ul>
        </section>
      ) : null}
      {warnings.length ? (
        <section aria-label="Outside common-practice ranges">
          <p className="mb-1 text-xs font-semibold uppercase tracking-wider text-amber-700">Outside the common-practice ranges (warnings; the sheet can still be saved)</p>
          <ul className="space-y-1">{warnings.map(row)}</ul>
        </section>
      ) : null}
    </div>
  );
}
