import { z } from "zod";

/** A row id in a route segment or query: a positive integer that fits an INT UNSIGNED key we use. */
export const idParamSchema = z.coerce.number().int().positive().max(2_147_483_647);
