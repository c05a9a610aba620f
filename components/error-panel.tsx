"use client";

import { Button } from "@/components/ui/button";

/** What a person sees when a page fails: no stack trace, a way to retry, and a reference for support. */
export function ErrorPanel({ digest, reset }: { digest?: string; reset: () => void }) {
  return (
    <div role="alert" className="mx-auto max-w-xl px-4 py-16 text-center">
      <h1 className="text-2xl font-semibold">This page could not be shown</h1>
      <p className="mt-3 text-graphite-700">
        Something went wrong on our side. Nothing you entered has been lost. Try again; if it keeps happening, tell your
        workshop&apos;s owner{digest ? ` and quote reference ${digest}` : ""}.
      </p>
      <Button className="mt-6" onClick={reset}>
        Try again
      </Button>
    </div>
  );
}
