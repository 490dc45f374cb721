import { setNotifications } from "@/lib/account/notifications";
import { requirePermission } from "@/lib/auth/session";
import { handle, readJson } from "@/lib/http/handle";
import { parseWith } from "@/lib/validation/parse";
import { notificationsInput } from "@/lib/validation/proposals";

export const runtime = "nodejs";

/** The member's own settings: for now, whether Understudy may e-mail them about proposals. */
export const PATCH = handle(async (request) => {
  const user = await requirePermission("account:use");
  const { notifyByEmail } = parseWith(notificationsInput, await readJson(request));
  return Response.json(await setNotifications(user.id, notifyByEmail));
});
