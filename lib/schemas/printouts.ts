import { z } from "zod";

/** Query of a printout download: the paper it is laid out for (default: by the workshop's unit). */
export const printoutQuerySchema = z.object({
  paper: z.enum(["a4", "letter"], { error: 'Paper must be "a4" or "letter".' }).optional(),
});
