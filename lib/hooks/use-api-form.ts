"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, type FieldValues, type Path, type Resolver } from "react-hook-form";
import type { z } from "zod";
import type { ErrorBody } from "@/lib/errors";
import { sendJson } from "@/lib/http/post-json";
import { isConnected } from "@/lib/offline/connection";

/**
 * A form validated in the browser by the same zod schema the route handler uses, posted as JSON;
 * the server's field errors land on the matching inputs, anything else in `formError`.
 */
export function useApiForm<TInput extends FieldValues, TOutput, TResponse>(options: {
  schema: z.ZodType<TOutput, TInput>;
  /** Where to send it; a function when the values decide (an existing list or a new one). */
  endpoint: string | ((values: TOutput) => string);
  /** The body, when it is not the values as they are. */
  toBody?: (values: TOutput) => unknown;
  /** POST unless given: PATCH for a form that changes what exists. */
  method?: "POST" | "PATCH";
  defaultValues: TInput;
  onSuccess: (data: TResponse, values: TOutput) => void;
  onError?: (error: ErrorBody, status: number) => boolean;
  /** What to do with the values when there is no connection (keep them to send later); without it, an error. */
  whenOffline?: (values: TOutput) => Promise<void> | void;
}) {
  const form = useForm<TInput, unknown, TOutput>({
    // The schema's input and output types are the form's; the resolver's generics cannot see that through z.ZodType.
    resolver: zodResolver(options.schema as never) as unknown as Resolver<TInput, unknown, TOutput>,
    defaultValues: options.defaultValues as never,
    mode: "onTouched",
  });
  const [formError, setFormError] = useState<string | null>(null);

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    if (options.whenOffline && !isConnected()) return options.whenOffline(values);
    const endpoint = typeof options.endpoint === "function" ? options.endpoint(values) : options.endpoint;
    const result = await sendJson<TResponse>(
      options.method ?? "POST",
      endpoint,
      options.toBody ? options.toBody(values) : values,
    );
    if (result.ok) return options.onSuccess(result.data, values);
    if (result.status === 0 && options.whenOffline) return options.whenOffline(values);
    if (options.onError?.(result.error, result.status)) return;
    const { field, message } = result.error;
    const fields = result.error.fields ?? (field ? { [field]: message } : {});
    const known = Object.keys(options.defaultValues);
    let placed = false;
    // Nested names ("original.number") land on the input of that path when its top-level field is the form's.
    for (const [name, message] of Object.entries(fields)) {
      if (known.includes(name.split(".")[0])) {
        form.setError(name as Path<TInput>, { message });
        placed = true;
      }
    }
    // A refusal that is not about the input (a conflict, a limit) is said above the button even when it names a field.
    if (!placed || result.status !== 400) setFormError(result.error.message);
  });

  return { form, onSubmit, formError, setFormError, pending: form.formState.isSubmitting };
}
