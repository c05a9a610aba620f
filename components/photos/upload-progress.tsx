"use client";

// The progress bar of an upload through the photo pipeline: bytes going up first, then the server
// preparing what it keeps. Shared by the stage photo form and the workshop logo form.

export type UploadPhase = "idle" | "sending" | "processing" | "done" | "failed";

/** What the bar announces in each phase (`processing`: what the server is doing meanwhile). */
export function uploadStatusText(phase: UploadPhase, progress: number, processing: string): string {
  switch (phase) {
    case "sending":
      return `Uploading… ${Math.round(progress)} %`;
    case "processing":
      return processing;
    case "done":
      return "Uploaded";
    case "failed":
      return "Not uploaded";
    default:
      return "";
  }
}

export function UploadProgress({ phase, progress, processing }: { phase: UploadPhase; progress: number; processing: string }) {
  if (phase === "idle") return null;
  const status = uploadStatusText(phase, progress, processing);
  return (
    <div className="space-y-1">
      <div
        role="progressbar"
        aria-label="Upload progress"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={Math.round(progress)}
        aria-valuetext={status}
        className="h-2.5 w-full overflow-hidden rounded-full bg-spruce-100"
      >
        <div className={phase === "failed" ? "h-full bg-ember-500" : "h-full bg-rosewood-700 transition-[width]"} style={{ width: `${progress}%` }} />
      </div>
      <p className="text-xs text-graphite-600" aria-live="polite">
        {status}
      </p>
    </div>
  );
}
