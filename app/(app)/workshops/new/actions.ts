"use server";

import { userAction } from "@/lib/auth/actions";
import { createWorkshop } from "@/lib/data/workshops";
import { workshopCreateSchema } from "@/lib/schemas/workshop";

/** Creates the workshop; its creator becomes the owner. */
export const createWorkshopAction = userAction(workshopCreateSchema, (input, user) => createWorkshop(user.id, input));
