"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, type DefaultValues, type FieldValues, type Path, type Resolver } from "react-hook-form";
import type { z } from "zod";
import type { ActionResult } from "@/server/action";

/**
 * react-hook-form with the shared zod schema in the browser, then the server action; field
 * errors from the server land beside their fields, a form-wide message in `formMessage`.
 */
export function useActionForm<S extends z.ZodType<FieldValues, FieldValues>, T = undefined>(
  schema: S,
  action: (input: z.input<S>) => Promise<ActionResult<T>>,
  options: { defaultValues?: DefaultValues<z.input<S>>; onSuccess?: (result: ActionResult<T>) => void } = {},
) {
  const form = useForm<z.input<S>, unknown, z.output<S>>({
    resolver: zodResolver(schema as never) as unknown as Resolver<z.input<S>, unknown, z.output<S>>,
    defaultValues: options.defaultValues,
    // Check on submit, then again as the person edits a field. Not on blur: a server error
    // vanishing when the field loses focus moves the layout under the pointer mid-click.
    mode: "onSubmit",
    reValidateMode: "onChange",
  });
  const [formMessage, setFormMessage] = useState<{ ok: boolean; text: string } | null>(null);

  // The browser checks with the schema first; the action gets the raw input and parses it
  // again with the same schema (sending the parsed output would apply transforms twice).
  const onSubmit = form.handleSubmit(async () => {
    setFormMessage(null);
    const result = await action(form.getValues());
    for (const [field, message] of Object.entries(result.fieldErrors ?? {})) {
      form.setError(field as Path<z.input<S>>, { type: "server", message });
    }
    if (result.message) setFormMessage({ ok: result.ok, text: result.message });
    if (result.ok) options.onSuccess?.(result);
  });

  const errorOf = (field: string): string | undefined => {
    const error = field.split(".").reduce<unknown>((node, key) => (node as Record<string, unknown> | undefined)?.[key], form.formState.errors);
    return (error as { message?: string } | undefined)?.message;
  };

  return { form, onSubmit, errorOf, formMessage, submitting: form.formState.isSubmitting };
}
