import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes } from "react";

export type FieldErrors = Partial<Record<string, string[]>>;

const inputClass =
  "block w-full rounded-md border border-ink-300 bg-white px-3 py-2 text-sm shadow-sm focus:border-pine-600 aria-[invalid=true]:border-danger-700";

/** A labelled input with its error shown beside it and linked through aria-describedby. */
export function Field({
  label,
  name,
  errors,
  hint,
  ...props
}: {
  label: string;
  name: string;
  errors?: string[];
  hint?: ReactNode;
} & InputHTMLAttributes<HTMLInputElement>) {
  const id = props.id ?? `field-${name}`;
  const errorId = `${id}-error`;
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-medium text-ink-700">
        {label}
      </label>
      <input
        id={id}
        name={name}
        className={inputClass}
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={errors?.length ? errorId : undefined}
        {...props}
      />
      {hint ? <p className="text-xs text-ink-500">{hint}</p> : null}
      <FieldError id={errorId} errors={errors} />
    </div>
  );
}

export function SelectField({
  label,
  name,
  errors,
  children,
  ...props
}: {
  label: string;
  name: string;
  errors?: string[];
  children: ReactNode;
} & SelectHTMLAttributes<HTMLSelectElement>) {
  const id = props.id ?? `field-${name}`;
  const errorId = `${id}-error`;
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-medium text-ink-700">
        {label}
      </label>
      <select
        id={id}
        name={name}
        className={inputClass}
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={errors?.length ? errorId : undefined}
        {...props}
      >
        {children}
      </select>
      <FieldError id={errorId} errors={errors} />
    </div>
  );
}

export function FieldError({ id, errors }: { id?: string; errors?: string[] }) {
  if (!errors?.length) return null;
  return (
    <p id={id} className="text-sm text-danger-700" role="alert">
      {errors.join(" ")}
    </p>
  );
}

/** A message for the form as a whole (not tied to one field). */
export function FormMessage({ tone = "error", children }: { tone?: "error" | "ok"; children: ReactNode }) {
  if (!children) return null;
  const cls = tone === "error" ? "bg-danger-100 text-danger-700" : "bg-ok-100 text-ok-700";
  return (
    <div className={`rounded-md px-3 py-2 text-sm ${cls}`} role={tone === "error" ? "alert" : "status"}>
      {children}
    </div>
  );
}
