"use client";

// The table's view, read from and written to the address bar. Next.js keeps useSearchParams in
// step with history.pushState/replaceState, so changing the view never reloads the page.
import { useSearchParams } from "next/navigation";
import { useCallback, useMemo } from "react";
import { changeView, listViewParams, readListView, type ListView } from "./list-view";

export function useListView(): [ListView, (change: Partial<ListView>, opts?: { replace?: boolean }) => void] {
  const params = useSearchParams();
  const view = useMemo(() => readListView(new URLSearchParams(params.toString())), [params]);
  const setView = useCallback(
    (change: Partial<ListView>, opts: { replace?: boolean } = {}) => {
      // Start from the address bar as it is now, not the last render's view: two changes made
      // before React re-renders (one select after another) must both survive.
      const current = readListView(new URLSearchParams(window.location.search));
      const next = listViewParams(changeView(current, change)).toString();
      const url = `${window.location.pathname}${next ? `?${next}` : ""}`;
      // Typing in the search box replaces the entry; each deliberate change can be undone with Back.
      if (opts.replace) window.history.replaceState(null, "", url);
      else window.history.pushState(null, "", url);
    },
    [],
  );
  return [view, setView];
}
