import { notFound } from "next/navigation";
import { AppError } from "@/lib/errors";
import { idParam } from "@/lib/validation/ids";

/** For pages at /things/[id]: a malformed or unknown id shows the 404 page; anything else is a real error. */
export async function loadByIdOr404<T>(idText: string, load: (id: number) => Promise<T>): Promise<T> {
  const parsed = idParam.safeParse({ id: idText });
  if (!parsed.success) notFound();
  try {
    return await load(parsed.data.id);
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  }
}
