import { handle } from "@/lib/http/handle";
import { GREASE_FITTINGS } from "@/lib/standards/threads";

export const runtime = "nodejs";

/** The threads grease fittings are made in, and the angles they come in. */
export const GET = handle(async () => Response.json(GREASE_FITTINGS));
