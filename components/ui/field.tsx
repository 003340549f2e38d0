"use client";
import { useId } from "react";

/**
 * One form pattern: every control has a visible label, a hint (optional) and an error line, both tied
 * to it with aria-describedby; the error line is announced (aria-live) and marks the control invalid.
 * `Field` is a text input, `TextareaField` and `SelectField` the same with other controls, and
 * `ChoiceField` a radio group (a fieldset with a legend). See components/works/source-check-form.tsx.
 */
type Common = { label: React.ReactNode; name: string; error?: string; hint?: React.ReactNode; className?: string };

const CONTROL = "rounded border border-rule bg-paper px-2 py-1.5 text-ink aria-[invalid=true]:border-accent";

function useDescribed(error?: string, hint?: React.ReactNode) {
  const id = useId();
  const errId = `${id}-err`;
  const hintId = `${id}-hint`;
  return {
    id,
    errId,
    hintId,
    control: {
      id,
      "aria-invalid": error ? true : undefined,
      "aria-describedby": [hint ? hintId : null, errId].filter(Boolean).join(" "),
    },
  };
}

function Messages({
  error,
  errId,
  hint,
  hintId,
}: {
  error?: string;
  errId: string;
  hint?: React.ReactNode;
  hintId: string;
}) {
  return (
    <>
      {hint && (
        <p id={hintId} className="text-xs text-ink-2">
          {hint}
        </p>
      )}
      <p id={errId} aria-live="polite" className="text-sm text-accent min-h-[1.25rem]">
        {error ?? ""}
      </p>
    </>
  );
}

/** The frame every labelled control shares: label, the control (given the ids it needs), hint and error. */
function Labelled({
  label,
  error,
  hint,
  className,
  children,
}: Omit<Common, "name"> & { children: (control: ReturnType<typeof useDescribed>["control"]) => React.ReactNode }) {
  const d = useDescribed(error, hint);
  return (
    <div className={`grid gap-1 content-start ${className ?? ""}`}>
      <label htmlFor={d.id} className="text-sm font-medium">
        {label}
      </label>
      {children(d.control)}
      <Messages error={error} errId={d.errId} hint={hint} hintId={d.hintId} />
    </div>
  );
}

export function Field({
  label,
  name,
  error,
  hint,
  className,
  ...input
}: Common & Omit<React.InputHTMLAttributes<HTMLInputElement>, "name">) {
  return (
    <Labelled label={label} error={error} hint={hint} className={className}>
      {(control) => <input name={name} className={CONTROL} {...control} {...input} />}
    </Labelled>
  );
}

export function TextareaField({
  label,
  name,
  error,
  hint,
  className,
  ...input
}: Common & Omit<React.TextareaHTMLAttributes<HTMLTextAreaElement>, "name">) {
  return (
    <Labelled label={label} error={error} hint={hint} className={className}>
      {(control) => <textarea name={name} className={CONTROL} {...control} {...input} />}
    </Labelled>
  );
}

export function SelectField({
  label,
  name,
  error,
  hint,
  className,
  children,
  ...input
}: Common & Omit<React.SelectHTMLAttributes<HTMLSelectElement>, "name">) {
  return (
    <Labelled label={label} error={error} hint={hint} className={className}>
      {(control) => (
        <select name={name} className={CONTROL} {...control} {...input}>
          {children}
        </select>
      )}
    </Labelled>
  );
}

/** A radio group. Nothing is checked unless `defaultValue` says so: a verdict is never assumed. */
export function ChoiceField({
  label,
  name,
  error,
  hint,
  className,
  options,
  defaultValue,
}: Common & { options: readonly { value: string; label: string }[]; defaultValue?: string }) {
  const d = useDescribed(error, hint);
  return (
    <fieldset
      className={`grid gap-1 ${className ?? ""}`}
      aria-invalid={d.control["aria-invalid"]}
      aria-describedby={d.control["aria-describedby"]}
    >
      <legend className="text-sm font-medium">{label}</legend>
      <div className="flex flex-wrap gap-x-4 gap-y-1">
        {options.map((o) => (
          <label key={o.value} className="inline-flex items-center gap-1.5">
            <input type="radio" name={name} value={o.value} defaultChecked={o.value === defaultValue} /> {o.label}
          </label>
        ))}
      </div>
      <Messages error={error} errId={d.errId} hint={hint} hintId={d.hintId} />
    </fieldset>
  );
}

/** The form-wide error (a failed request with no field named). */
export function FormError({ message }: { message?: string }) {
  return (
    <p role="alert" aria-live="assertive" className="text-sm text-accent min-h-[1.25rem]">
      {message ?? ""}
    </p>
  );
}

/** A success note after saving, announced politely. */
export function FormStatus({ message }: { message?: string | null }) {
  return (
    <p role="status" aria-live="polite" className="text-sm min-h-[1.25rem]">
      {message ?? ""}
    </p>
  );
}
