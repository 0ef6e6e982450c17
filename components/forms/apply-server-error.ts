import type { FieldValues, Path, UseFormReturn } from "react-hook-form";
import { toast } from "sonner";
import { ApiError } from "@/lib/client/fetch-json";

/** Puts a server error on the field it names, or in a toast when it names none. */
export function applyServerError<T extends FieldValues>(form: UseFormReturn<T>, e: unknown): void {
  if (e instanceof ApiError && e.path && e.path in form.getValues()) {
    form.setError(e.path as Path<T>, { message: e.message.replace(`${e.path}: `, "") });
    return;
  }
  toast.error(e instanceof Error ? e.message : "Something went wrong.");
}
