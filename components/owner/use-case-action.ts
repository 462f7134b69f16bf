"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { useMutation } from "@tanstack/react-query";
import { ApiError } from "@/lib/queries/api-fetch";

/** A mutation that refreshes the case page on success and keeps a readable error otherwise. */
export function useCaseAction<TArgs, TResult>(
  action: (args: TArgs) => Promise<TResult>,
  onDone?: (r: TResult) => void,
) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const mutation = useMutation({
    mutationFn: action,
    onMutate: () => setError(null),
    onSuccess: (result) => {
      onDone?.(result);
      router.refresh();
    },
    onError: (e) =>
      setError(
        e instanceof ApiError
          ? (Object.values(e.fieldErrors ?? {})[0]?.[0] ?? e.message)
          : "No answer from the server; nothing you typed was lost. Try again.",
      ),
  });
  return { ...mutation, error };
}
