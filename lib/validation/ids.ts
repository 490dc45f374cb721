import { z } from "zod";

const MAX_ID = 2_147_483_647;

/** A database id in a JSON body: a positive whole number. `what` names the thing in the messages. */
export const positiveId = (what: string) =>
  z
    .number({ error: `Choose ${what}.` })
    .int(`Choose ${what}.`)
    .positive(`Choose ${what}.`)
    .max(MAX_ID, `There is no such ${what.replace(/^(the|a|an) /, "")}.`);

/** A database id in a URL segment or query string. */
export const idFromText = (what: string) =>
  z.coerce
    .number({ error: `A ${what} id is a number.` })
    .int(`A ${what} id is a whole number.`)
    .positive(`A ${what} id is a positive number.`)
    .max(MAX_ID, `No ${what} has that id.`);

/** The `[id]` segment of a route. */
export const idParam = z.object({ id: idFromText("record") });

/** The `[id]/…/[lineId]` segments of a job list line's routes. */
export const listLineParams = z.object({ id: idFromText("list"), lineId: idFromText("line") });
