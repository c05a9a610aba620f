"use client";

// A lazily loaded schema inside a component, for live checks that parse on every render: null until
// it has loaded. It starts loading once `wanted` is true (at once by default, after the page is up).
import { useEffect, useState } from "react";
import type { LazySchema } from "./lazy-schema";

export function useLazySchema<S>(lazy: LazySchema<S>, wanted = true): S | null {
  const [schema, setSchema] = useState<S | null>(null);
  useEffect(() => {
    if (!wanted || schema) return;
    let live = true;
    lazy.load().then(
      (s) => live && setSchema(() => s),
      () => undefined, // offline: the live checks wait; submitting says what failed
    );
    return () => {
      live = false;
    };
  }, [lazy, wanted, schema]);
  return schema;
}
