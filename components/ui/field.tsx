"use client";
import { useId } from "react";

/** A labelled input whose error is announced (aria-live) and tied to it (aria-describedby). */
export function Field({
  label,
  name,
  error,
  hint,
  ...input
}: { label: string; name: string; error?: string; hint?: string } & React.InputHTMLAttributes<HTMLInputElement>) {
  const id = useId();
  const errId = `${id}-err`;
  const hintId = `${id}-hint`;
  return (
    <div className="grid gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        {label}
      </label>
      <input
        id={id}
        name={name}
        aria-invalid={error ? true : undefined}
        aria-describedby={[hint ? hintId : null, errId].filter(Boolean).join(" ")}
        className="rounded border border-rule bg-paper px-2 py-1.5 text-ink aria-[invalid=true]:border-accent"
        {...input}
      />
      {hint && (
        <p id={hintId} className="text-xs text-ink-2">
          {hint}
        </p>
      )}
      <p id={errId} aria-live="polite" className="text-sm text-accent min-h-[1.25rem]">
        {error ?? ""}
      </p>
    </div>
  );
}

export function FormError({ message }: { message?: string }) {
  return (
    <p role="alert" aria-live="assertive" className="text-sm text-accent min-h-[1.25rem]">
      {message ?? ""}
    </p>
  );
}
