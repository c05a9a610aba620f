// The new-commission form's schema: the shared commissionCreateSchema, with the price as typed text
// and the client required for the workshop. Loaded by the form on its first validation, so zod
// stays out of the page's first load.
import { z } from "zod";
import { parseMajor } from "@/lib/money/money";
import { commissionCreateSchema } from "@/lib/schemas/commission";

export type Mode = "request" | "owner" | "builder";

/** The shared schema, with the price as typed text and the client required for the workshop. */
export function formSchema(mode: Mode, currency: string) {
  return commissionCreateSchema
    .omit({ priceMinor: true, currency: true })
    .extend({ price: z.string().trim().max(20).default("") })
    .superRefine((v, ctx) => {
      if (mode !== "request" && !v.clientId) ctx.addIssue({ code: "custom", path: ["clientId"], message: "Choose the client." });
      if (mode === "owner" && v.price !== "" && !parseMajor(v.price, currency)) ctx.addIssue({ code: "custom", path: ["price"], message: "Enter an amount such as 3200 or 3200.50." });
    });
}
