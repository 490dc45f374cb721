import { z } from "zod";
import { ROLES } from "@/lib/auth/roles";

export const setRoleBody = z.object({
  role: z.enum(ROLES, { error: `Choose one of: ${ROLES.join(", ")}.` }),
});
