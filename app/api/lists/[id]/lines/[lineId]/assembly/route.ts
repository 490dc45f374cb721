import { z } from "zod";
import { requirePermission } from "@/lib/auth/session";
import { handle } from "@/lib/http/handle";
import { addRestOfAssembly } from "@/lib/lists/lists";
import { parseWith } from "@/lib/validation/parse";
import { idParam } from "@/lib/validation/submissions";

export const runtime = "nodejs";

const params2 = idParam.extend({ lineId: z.coerce.number({ error: "A line id is a number." }).int("A line id is a whole number.").positive("A line id is positive.").max(2_147_483_647, "No line has that id.") });

/** Adds the other parts of this line's assembly. */
export const POST = handle<{ params: Promise<{ id: string; lineId: string }> }>(async (_request, { params }) => {
  const user = await requirePermission("lists:manage");
  const { id, lineId } = parseWith(params2, await params);
  return Response.json(await addRestOfAssembly(user.id, id, lineId));
});
