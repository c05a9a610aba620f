// The result's issues: errors (impossible or dangerous) first, then warnings (worth a look).
import { Badge } from "@/components/ui/badge";
import type { SpecIssue } from "@/lib/schemas/instrument-spec";

export interface IssueListProps {
  issues: SpecIssue[];
  /** Called with an issue's path (e.g. "strings.2.gaugeIn") to take the builder to that field. */
  onSelect?: (path: string) => void;
}

export function IssueList({ issues, onSelect }: IssueListProps) {
  if (issues.length === 0) {
    return (
      <p className="text-sm text-moss-700" role="status">
        No errors or warnings for this spec.
      </p>
    );
  }
  const sorted = [...issues].sort((a, b) => (a.level === b.level ? 0 : a.level === "error" ? -1 : 1));
  return (
    <ul className="space-y-2" aria-label="Errors and warnings">
      {sorted.map((i, k) => (
        <li key={`${i.code}-${i.path}-${k}`} className="flex items-start gap-2 text-sm">
          <Badge tone={i.level === "error" ? "danger" : "warning"}>{i.level}</Badge>
          <span className="flex-1">
            {i.message}
            {onSelect && i.path ? (
              <button type="button" className="ml-2 text-xs text-rosewood-700 underline" onClick={() => onSelect(i.path)}>
                go to field
              </button>
            ) : null}
          </span>
        </li>
      ))}
    </ul>
  );
}
