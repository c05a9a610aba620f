import { z } from "zod";

// The workshop's logo: what its upload asks for (the file route's input) and what the upload answers.

/** The upload's input: which workshop, by its slug as in the page URL (the id comes from the membership). */
export const logoUploadInputSchema = z.object({ workshop: z.string().min(1).max(64) });
export type LogoUploadInput = z.infer<typeof logoUploadInputSchema>;

/** What the logo route's `onUploadComplete` answers (the uploader reads it as serverData). */
export type LogoUploadResult = { ok: true; width: number; height: number } | { ok: false; code: string; message: string };
