import { getInputProps, type FieldMetadata } from "@conform-to/react";

/** conform's prop getters include React's `key`, which JSX must receive directly, not in a spread. */
export function withoutKey<Props extends { key?: unknown }>(props: Props): Omit<Props, "key"> {
  const { key: _key, ...rest } = props;
  return rest;
}

/** A field's messages under it, where the field's `aria-describedby` points. */
export function FieldError({
  meta,
  testId,
}: {
  meta: Pick<FieldMetadata<unknown>, "errorId" | "errors" | "name">;
  testId?: string;
}) {
  if (!meta.errors?.length) return null;
  return (
    <p id={meta.errorId} className="text-sm text-stop" data-testid={testId ?? `error-${meta.name}`}>
      {meta.errors.join(" ")}
    </p>
  );
}

interface TextFieldProps {
  label: string;
  meta: FieldMetadata<string>;
  type?: "text" | "email" | "password" | "search";
  autoComplete?: string;
  hint?: string;
}

/** A labelled input with its hint and field errors, wired for screen readers by conform's ids. */
export function TextField({ label, meta, type = "text", autoComplete, hint }: TextFieldProps) {
  const { key, ...inputProps } = getInputProps(meta, { type, ariaDescribedBy: hint ? `${meta.id}-hint` : undefined });
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={meta.id} className="text-sm font-medium">
        {label}
      </label>
      <input
        key={key}
        {...inputProps}
        autoComplete={autoComplete}
        className="rounded border border-rule bg-sheet px-3 py-2 aria-[invalid]:border-stop"
      />
      {hint && (
        <p id={`${meta.id}-hint`} className="text-xs text-graphite-soft">
          {hint}
        </p>
      )}
      {meta.errors && (
        <p id={meta.errorId} className="text-sm text-stop">
          {meta.errors.join(" ")}
        </p>
      )}
    </div>
  );
}

export function FormErrors({ id, errors }: { id: string; errors?: string[] }) {
  if (!errors?.length) return null;
  return (
    <p id={id} role="alert" className="rounded border border-stop/40 bg-stop/5 px-3 py-2 text-sm text-stop">
      {errors.join(" ")}
    </p>
  );
}

export function SubmitButton({ children }: { children: React.ReactNode }) {
  return (
    <button type="submit" className="rounded bg-ochre px-4 py-2 font-medium text-white hover:bg-ochre-deep">
      {children}
    </button>
  );
}
