"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, type DefaultValues, type FieldValues, type Resolver } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";
import { useToast } from "@/components/ui/toast";
import { send } from "@/lib/client-requests";
import { showServerErrors } from "./server-errors";

interface ApiFormOptions<T extends FieldValues> {
  schema: z.ZodType;
  defaultValues: DefaultValues<T>;
  url: string;
  method: "POST" | "PATCH";
  /** Said in a toast when the server has saved it. */
  saved: string;
}

/**
 * A react-hook-form form that validates with the shared schema, sends the values to a route handler,
 * puts the server's field errors on the fields and refreshes the page's server data when saved.
 */
export function useApiForm<T extends FieldValues>({ schema, defaultValues, url, method, saved }: ApiFormOptions<T>) {
  const router = useRouter();
  const notify = useToast();
  const [serverError, setServerError] = useState<string | null>(null);
  const form = useForm<T>({ resolver: zodResolver(schema as never) as unknown as Resolver<T>, defaultValues });
  const onSubmit = form.handleSubmit(async (values) => {
    setServerError(null);
    const answer = await send(url, method, values);
    if (!answer.ok) {
      setServerError(answer.error);
      showServerErrors(form.setError, answer.fieldErrors);
      return;
    }
    notify({ title: saved, tone: "ok" });
    form.reset(method === "PATCH" ? values : defaultValues);
    router.refresh();
  });
  return { form, onSubmit, serverError };
}
