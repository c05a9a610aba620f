"use client";

import { useRouter } from "next/navigation";
import { useRef, useState, type FormEvent } from "react";
import type { UploadThingError } from "uploadthing/server";
import { lazySchema } from "@/components/forms/lazy-schema";
import { useUploadThing } from "@/components/photos/upload-helpers";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { describedBy, Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { ACCEPTED_MIME_TYPES, formatBytes, uploadBatchProblem } from "@/lib/photos/rules";
import type { PhotoUploadResult } from "@/lib/schemas/photo";

const photoCaptionSchema = lazySchema(() => import("@/lib/schemas/photo").then((m) => m.photoCaptionSchema));

type Phase = "idle" | "sending" | "processing" | "done" | "failed";

const SERVICE_DOWN = "The photo service could not be reached, so the upload did not go through. Nothing was saved; try again in a moment.";

/** A message a person can act on, from whatever the upload client reports. */
function uploadErrorMessage(err: UploadThingError): string {
  // The browser's PUT to the service failed, or the service itself answered with an error.
  if (err.code === "UPLOAD_FAILED" || err.code === "INTERNAL_CLIENT_ERROR") return SERVICE_DOWN;
  return err.message || "The upload did not go through. Nothing was saved; try again.";
}

/** Caption, files, and a progress bar: bytes going up first, then the server preparing the photos. */
export function PhotoUploadForm({ slug, commissionId, stageLabel }: { slug: string; commissionId: number; stageLabel: string }) {
  const router = useRouter();
  const fileInput = useRef<HTMLInputElement>(null);
  const [files, setFiles] = useState<File[]>([]);
  const [caption, setCaption] = useState("");
  const [errors, setErrors] = useState<{ caption?: string; files?: string }>({});
  const [phase, setPhase] = useState<Phase>("idle");
  const [progress, setProgress] = useState(0);
  const [notice, setNotice] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const failure = useRef<string | null>(null);

  const { startUpload, isUploading } = useUploadThing("stagePhoto", {
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

  async function submit(e: FormEvent) {
    e.preventDefault();
    setNotice(null);
    const checkedCaption = await photoCaptionSchema.safeParse(caption);
    const problem = uploadBatchProblem(files.map((f) => ({ name: f.name, size: f.size, type: f.type })));
    const next = { caption: checkedCaption.success ? undefined : checkedCaption.error.issues[0]?.message, files: problem?.message };
    setErrors(next);
    if (next.caption || next.files) return;

    failure.current = null;
    setProgress(0);
    setPhase("sending");
    const results = await startUpload(files, { workshop: slug, commissionId, caption: checkedCaption.data! });
    if (!results) {
      setPhase("failed");
      setNotice({ tone: "error", text: failure.current ?? SERVICE_DOWN });
      return;
    }
    const refused = results.filter((r) => !(r.serverData as PhotoUploadResult | null)?.ok);
    const added = results.length - refused.length;
    setPhase(refused.length ? "failed" : "done");
    setProgress(100);
    const lines = refused.map((r) => {
      const data = r.serverData as PhotoUploadResult | null;
      // No answer at all: the service stopped waiting for us while the photo was still being prepared.
      return data && !data.ok ? data.message : `${r.name} arrived but was not confirmed in time; it appears in the gallery once it is ready (refresh in a moment).`;
    });
    if (added) lines.unshift(`${added} ${added === 1 ? "photo" : "photos"} added to “${stageLabel}”.`);
    setNotice({ tone: refused.length ? "error" : "success", text: lines.join(" ") });
    if (added || refused.some((r) => r.serverData === null)) router.refresh();
    if (added) {
      setFiles([]);
      setCaption("");
      if (fileInput.current) fileInput.current.value = "";
    }
  }

  const busy = isUploading || phase === "sending" || phase === "processing";
  const status =
    phase === "sending" ? `Uploading… ${Math.round(progress)} %` : phase === "processing" ? "Removing location data and making thumbnails…" : phase === "done" ? "Uploaded" : phase === "failed" ? "Not uploaded" : "";

  return (
    <form onSubmit={submit} noValidate className="space-y-4" aria-label="Photo upload">
      {notice ? <Alert tone={notice.tone}>{notice.text}</Alert> : null}
      <Field id="photo-caption" label="Caption" hint="What the photos show, e.g. “Fret slots cut, before the wire goes in”. It goes with every photo of this upload." error={errors.caption}>
        <Input id="photo-caption" value={caption} maxLength={300} onChange={(e) => setCaption(e.target.value)} {...describedBy("photo-caption", errors.caption)} />
      </Field>
      <Field id="photo-files" label="Photos" error={errors.files}>
        <input
          ref={fileInput}
          id="photo-files"
          type="file"
          multiple
          accept={ACCEPTED_MIME_TYPES.join(",")}
          onChange={(e) => setFiles([...(e.target.files ?? [])])}
          className="block w-full text-sm file:mr-3 file:rounded-chip file:border file:border-spruce-300 file:bg-white file:px-3 file:py-2 file:text-sm file:font-semibold"
          {...describedBy("photo-files", errors.files)}
        />
      </Field>
      {files.length ? (
        <ul className="text-xs text-graphite-600">
          {files.map((f) => (
            <li key={`${f.name}-${f.size}`}>
              {f.name} · {formatBytes(f.size)}
            </li>
          ))}
        </ul>
      ) : null}
      {phase !== "idle" ? (
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
      ) : null}
      <Button type="submit" busy={busy}>
        Upload
      </Button>
    </form>
  );
}
