import { useState, type ChangeEvent, type FormEvent } from "react";
import { z } from "zod";
import { isApiError } from "@/api/client";
import { EMPTY_CARD, type FieldProps } from "./card-fields";

/**
 * State of a pass payment form (buying or renewing): values, per-field messages from the schema
 * or the server, and a submit that checks first and never keeps card details after an attempt.
 */
export function usePaymentForm<T extends Record<string, string>>(schema: z.ZodType<T>, empty: T, send: (values: T) => Promise<void>) {
  const [values, setValues] = useState<T>(empty);
  const [errors, setErrors] = useState<Partial<Record<keyof T, string>>>({});
  const names = Object.keys(empty) as (keyof T & string)[];

  const field = (name: keyof T & string): FieldProps => ({
    value: values[name],
    onChange: (e: ChangeEvent<HTMLInputElement>) => setValues((v) => ({ ...v, [name]: e.target.value })),
    error: errors[name],
  });

  async function submit(event: FormEvent) {
    event.preventDefault();
    const parsed = schema.safeParse(values);
    if (!parsed.success) {
      const flat = z.flattenError(parsed.error).fieldErrors as Partial<Record<string, string[]>>;
      setErrors(Object.fromEntries(names.map((n) => [n, flat[n]?.[0]])) as Partial<Record<keyof T, string>>);
      return;
    }
    setErrors({});
    try {
      await send(values);
    } catch (error) {
      if (isApiError(error) && error.fields) {
        const fields = error.fields;
        setErrors(Object.fromEntries(names.map((n) => [n, fields[n]?.[0]])) as Partial<Record<keyof T, string>>);
      }
      setValues((v) => ({ ...v, ...EMPTY_CARD }));
    }
  }

  return { field, submit };
}
