"use client";

import { useState } from "react";
import { useForm, type DefaultValues, type FieldValues, type Path } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";
import { callApi } from "./call-api";

interface ApiFormOptions<Input extends FieldValues, Output> {
  url: string;
  method?: "POST" | "PATCH" | "PUT";
  defaultValues?: DefaultValues<Input>;
  /** Shapes the validated values into the request body (JSON, or a FormData), where it differs from them. */
  toBody?: (values: Output) => unknown;
  /** Called with the server's answer and the values that were sent. */
  onSuccess: (body: Record<string, unknown>, values: Output) => void | Promise<void>;
}

export const FIX_THE_FIELDS = "Nothing was saved: each field marked below says what to change.";

/**
 * A react-hook-form form validated in the browser with the same zod schema the route handler
 * uses, sent to that handler through `callApi`; the server's field errors land on the same fields.
 */
export function useApiForm<Input extends FieldValues, Output>(schema: z.ZodType<Output, Input>, options: ApiFormOptions<Input, Output>) {
  const form = useForm<Input, unknown, Output>({ resolver: zodResolver(schema), defaultValues: options.defaultValues });
  const [formError, setFormError] = useState<string | null>(null);
  const submit = form.handleSubmit(async (values) => {
    setFormError(null);
    const answer = await callApi(options.method ?? "POST", options.url, options.toBody ? options.toBody(values) : values);
    if (!answer.ok) {
      const fields = Object.entries(answer.fieldErrors);
      for (const [field, message] of fields) form.setError(field as Path<Input>, { type: "server", message });
      // Each field's message stands beside it; the form's own line only points there, so nothing is said twice.
      setFormError(fields.length ? FIX_THE_FIELDS : answer.error);
      return;
    }
    await options.onSuccess(answer.body, values);
  });
  return { form, submit, formError, setFormError };
}
