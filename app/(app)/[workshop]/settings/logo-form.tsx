"use client";

import { useRouter } from "next/navigation";
import { useRef, useState, useTransition, type FormEvent } from "react";
import { SERVICE_DOWN } from "@/components/photos/upload-errors";
import { UploadProgress } from "@/components/photos/upload-progress";
import { useUploadPipeline } from "@/components/photos/use-upload-pipeline";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { describedBy, Field } from "@/components/ui/field";
import { ACCEPTED_MIME_TYPES, formatBytes, LOGO_EDGE_PX, LOGO_UPLOAD_LIMITS, MAX_LOGO_BYTES, uploadBatchProblem } from "@/lib/photos/rules";
import type { LogoUploadResult } from "@/lib/schemas/workshop-logo";
import { removeLogoAction } from "./actions";

/** The logo now (from the authorised logo route), an upload with a progress bar, and removal. */
export function LogoForm({ slug, logoUrl }: { slug: string; logoUrl: string | null }) {
  const router = useRouter();
  const fileInput = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [error, setError] = useState<string | undefined>();
  const [notice, setNotice] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const [removing, startRemoving] = useTransition();
  const { startUpload, busy, phase, setPhase, progress, setProgress, failure, begin } = useUploadPipeline("workshopLogo");

  async function submit(e: FormEvent) {
    e.preventDefault();
    setNotice(null);
    const problem = uploadBatchProblem(file ? [{ name: file.name, size: file.size, type: file.type }] : [], LOGO_UPLOAD_LIMITS);
    setError(problem?.message);
    if (problem || !file) return;
    begin();
    const results = await startUpload([file], { workshop: slug });
    const result = results?.[0]?.serverData as LogoUploadResult | null | undefined;
    if (!results) {
      setPhase("failed");
      setNotice({ tone: "error", text: failure.current ?? SERVICE_DOWN });
      return;
    }
    setProgress(100);
    if (result?.ok) {
      setPhase("done");
      setNotice({ tone: "success", text: `Logo saved (${result.width} × ${result.height} px). It shows in the workshop's header and on build sheets.` });
      setFile(null);
      if (fileInput.current) fileInput.current.value = "";
      router.refresh();
    } else {
      setPhase("failed");
      setNotice({ tone: "error", text: result ? result.message : "The logo arrived but was not confirmed in time; reload the page in a moment to see whether it was saved." });
    }
  }

  const remove = () =>
    startRemoving(async () => {
      setNotice(null);
      const r = await removeLogoAction(slug, {});
      if (r.ok) {
        setPhase("idle");
        setNotice({ tone: "success", text: "Logo removed. Pages and build sheets show the workshop's name alone." });
        router.refresh();
      } else setNotice({ tone: "error", text: r.message });
    });

  return (
    <form onSubmit={submit} noValidate className="space-y-4" aria-label="Workshop logo">
      {notice ? <Alert tone={notice.tone}>{notice.text}</Alert> : null}
      <div className="flex flex-wrap items-center gap-4">
        {logoUrl ? (
          // A plain img: the bytes come from our authorised route, which image optimisation would bypass.
          <img src={logoUrl} alt="The workshop's logo" className="h-16 w-auto max-w-40 rounded-chip border border-spruce-200 bg-white object-contain p-1" />
        ) : (
          <p className="text-sm text-graphite-600">No logo yet: pages and build sheets show the workshop&apos;s name alone.</p>
        )}
        {logoUrl ? (
          <Button variant="ghost" size="sm" onClick={remove} busy={removing}>
            Remove the logo
          </Button>
        ) : null}
      </div>
      <Field
        id="logo-file"
        label={logoUrl ? "Replace it with" : "Logo image"}
        hint={`One JPEG, PNG, WebP or AVIF image of at most ${formatBytes(MAX_LOGO_BYTES)}; it is kept at most ${LOGO_EDGE_PX} px across, without its camera or location data.`}
        error={error}
      >
        <input
          ref={fileInput}
          id="logo-file"
          type="file"
          accept={ACCEPTED_MIME_TYPES.join(",")}
          onChange={(e) => setFile(e.target.files?.[0] ?? null)}
          className="block w-full text-sm file:mr-3 file:rounded-chip file:border file:border-spruce-300 file:bg-white file:px-3 file:py-2 file:text-sm file:font-semibold"
          {...describedBy("logo-file", error)}
        />
      </Field>
      <UploadProgress phase={phase} progress={progress} processing="Removing metadata and fitting the logo…" />
      <Button type="submit" variant="secondary" busy={busy}>
        Upload logo
      </Button>
    </form>
  );
}
