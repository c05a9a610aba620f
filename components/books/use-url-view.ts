"use client";

// A view kept in the address bar: read with `read`, written with `toParams` after `change`. Next.js
// keeps useSearchParams in step with history.pushState, so a change never reloads the page; each
// change can be undone with Back.
import { useSearchParams } from "next/navigation";
import { useCallback, useMemo } from "react";

export function useUrlView<V>(read: (p: URLSearchParams) => V, toParams: (v: V) => URLSearchParams, change: (v: V, c: Partial<V>) => V): [V, (c: Partial<V>) => void] {
  const params = useSearchParams();
  const view = useMemo(() => read(new URLSearchParams(params.toString())), [params, read]);
  const setView = useCallback(
    (c: Partial<V>) => {
      const next = toParams(change(view, c)).toString();
      window.history.pushState(null, "", `${window.location.pathname}${next ? `?${next}` : ""}`);
    },
    [view, toParams, change],
  );
  return [view, setView];
}
