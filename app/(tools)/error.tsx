"use client";

import { ErrorPanel } from "@/components/error-panel";

export default function ToolsError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return <ErrorPanel digest={error.digest} reset={reset} />;
}
