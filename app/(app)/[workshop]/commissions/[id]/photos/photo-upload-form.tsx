"use client";

import { useRouter } from "next/navigation";
import { useRef, useState, type FormEvent } from "react";
import { lazySchema } from "@/components/forms/lazy-schema";
import { SERVICE_DOWN } from "@/components/photos/upload-errors";
import { UploadProgress } from "@/components/photos/upload-progress";
import { useUploadPipeline } from "@/components/photos/use-upload-pipeline";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { describedBy, Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { ACCEPTED_MIME_TYPES, formatBytes, uploadBatchProblem } from "@/lib/photos/rules";
import type { PhotoUploadResult } from "@/lib/schemas/photo";

const photoCaptionSchema = lazySchema(() => import("@/lib/schemas/photo").then((m) => m.photoCaptionSchema));

const PROCESSING = "Removing location data and making thumbnails…";

/** Caption, files, and a progress bar: bytes going up first, then the server preparing the photos. */
export function PhotoUploadForm({ slug, commissionId, stageLabel }: { slug: string; commissionId: number; stageLabel: string }) {
  const router = useRouter();
  const fileInput = useRef<HTMLInputElement>(null);
  const [files, setFiles] = useState<File[]>([]);
  const [caption, setCaption] = useState("");
  const [errors, setErrors] = useState<{ caption?: string; files?: string }>({});
  const [notice, setNotice] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const { startUpload, busy, phase, setPhase, progress, setProgress, failure, begin } = useUploadPipeline("stagePhoto");

  async function submit(e: FormEvent) {
    e.preventDefault();
    setNotice(null);
    const checkedCaption = await photoCaptionSchema.safeParse(caption);
    const problem = uploadBatchProblem(files.map((f) => ({ name: f.name, size: f.size, type: f.type })));
    const next = { caption: checkedCaption.success ? undefined : checkedCaption.error.issues[0]?.message, files: problem?.message };
    setErrors(next);
    if (next.caption || next.files) return;

    begin();
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
      <UploadProgress phase={phase} progress={progress} processing={PROCESSING} />
      <Button type="submit" busy={busy}>
        Upload
      </Button>
    </form>
  );
}
