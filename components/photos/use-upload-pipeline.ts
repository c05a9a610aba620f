"use client";

// The upload hook of one of the app's file routes with what its form shows: the phase and the
// bytes sent for the progress bar, and the client's own failure message when the upload breaks.
import { useRef, useState } from "react";
import type { PhotoFileRouter } from "@/lib/photos/file-router";
import { uploadErrorMessage } from "./upload-errors";
import { useUploadThing } from "./upload-helpers";
import type { UploadPhase } from "./upload-progress";

export function useUploadPipeline<R extends keyof PhotoFileRouter>(route: R) {
  const [phase, setPhase] = useState<UploadPhase>("idle");
  const [progress, setProgress] = useState(0);
  const failure = useRef<string | null>(null);
  const { startUpload, isUploading } = useUploadThing(route, {
    uploadProgressGranularity: "fine",
    onUploadBegin: () => setPhase("sending"),
    onUploadProgress: (p) => {
      setProgress(p);
      if (p >= 100) setPhase("processing");
    },
    onUploadError: (err) => {
      failure.current = uploadErrorMessage(err);
    },
  });
  /** Before a new upload: nothing failed yet, the bar at 0 and showing. */
  const begin = () => {
    failure.current = null;
    setProgress(0);
    setPhase("sending");
  };
  const busy = isUploading || phase === "sending" || phase === "processing";
  return { startUpload, busy, phase, setPhase, progress, setProgress, failure, begin };
}
