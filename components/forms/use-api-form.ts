"use client";

import { useState } from "react";
import { useForm, type DefaultValues, type FieldValues, type Path } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";

interface ApiFormOptions<Input extends FieldValues, Output> {
  url: string;
  method?: "POST" | "PATCH" | "PUT";
  defaultValues?: DefaultValues<Input>;
  /** Shapes the validated values into the request body, where it differs from them. */
  toBody?: (values: Output) => unknown;
  onSuccess: (body: Record<string, unknown>) => void | Promise<void>;
}

/**
 * A react-hook-form form validated in the browser with the same zod schema the route handler
 * uses, sent to that handler as JSON; the server's field errors land on the same fields.
 */
export function useApiForm<Input extends FieldValues, Output>(schema: z.ZodType<Output, Input>, options: ApiFormOptions<Input, Output>) {
  const form = useForm<Input, unknown, Output>({ resolver: zodResolver(schema), defaultValues: options.defaultValues });
  const [formError, setFormError] = useState<string | null>(null);
  const submit = form.handleSubmit(async (values) => {
    setFormError(null);
    let response: Response;
    try {
      response = await fetch(options.url, {
        method: options.method ?? "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify(options.toBody ? options.toBody(values) : values),
      });
    } catch {
      setFormError("The server could not be reached: check the connection and try again. Nothing was saved.");
      return;
    }
    const body = (await response.json().catch(() => ({}))) as Record<string, unknown>;
    if (!response.ok) {
      for (const [field, message] of Object.entries((body.fieldErrors as Record<string, string>) ?? {})) {
        form.setError(field as Path<Input>, { message });
      }
      setFormError(typeof body.error === "string" ? body.error : `The server answered ${response.status}; nothing was saved.`);
      return;
    }
    await options.onSuccess(body);
  });
  return { form, submit, formError, setFormError };
}
