import { useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes } from 'react';

const controlClass =
  'block min-h-tap w-full rounded-lg border-2 border-line bg-surface px-3 py-2 text-base text-ink ' +
  'aria-[invalid=true]:border-danger aria-[invalid=true]:border-4';

interface FieldFrameProps {
  id: string;
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  children: ReactNode;
}

function FieldFrame({ id, label, hint, error, children }: FieldFrameProps) {
  return (
    <div className="flex min-w-0 flex-col gap-1">
      <label htmlFor={id} className="font-bold">
        {label}
      </label>
      {hint ? (
        <p id={`${id}-hint`} className="text-muted">
          {hint}
        </p>
      ) : null}
      {children}
      <FieldError id={`${id}-error`} message={error} />
    </div>
  );
}

// Beside the field, with a mark so the error is not told by colour alone.
export function FieldError({ id, message }: { id: string; message?: string }) {
  if (!message) return null;
  return (
    <p id={id} className="flex items-start gap-1 font-bold text-danger" data-testid="field-error">
      <span aria-hidden="true">⚠</span>
      <span>{message}</span>
    </p>
  );
}

function describedBy(id: string, hint: unknown, error: unknown): string | undefined {
  const ids = [hint ? `${id}-hint` : '', error ? `${id}-error` : ''].filter(Boolean);
  return ids.length ? ids.join(' ') : undefined;
}

export interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'id'> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  id?: string;
}

export function TextField({ label, hint, error, id, className = '', ...rest }: TextFieldProps) {
  const generated = useId();
  const fieldId = id ?? generated;
  return (
    <FieldFrame id={fieldId} label={label} hint={hint} error={error}>
      <input
        id={fieldId}
        className={`${controlClass} ${className}`}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fieldId, hint, error)}
        {...rest}
      />
    </FieldFrame>
  );
}

export interface SelectFieldProps extends Omit<SelectHTMLAttributes<HTMLSelectElement>, 'id'> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  id?: string;
  children: ReactNode;
}

export function SelectField({ label, hint, error, id, className = '', children, ...rest }: SelectFieldProps) {
  const generated = useId();
  const fieldId = id ?? generated;
  return (
    <FieldFrame id={fieldId} label={label} hint={hint} error={error}>
      <select
        id={fieldId}
        className={`${controlClass} ${className}`}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fieldId, hint, error)}
        {...rest}
      >
        {children}
      </select>
    </FieldFrame>
  );
}

// An e-mail address: the keyboard with @ on a phone.
export function EmailField(props: Omit<TextFieldProps, 'type' | 'inputMode'>) {
  return <TextField type="email" inputMode="email" {...props} />;
}

// A password; `isNew` tells the browser's password manager to offer a new one instead of filling the saved one.
export function PasswordField({ isNew = false, ...props }: Omit<TextFieldProps, 'type'> & { isNew?: boolean }) {
  return <TextField type="password" autoComplete={isNew ? 'new-password' : 'current-password'} {...props} />;
}

export interface CheckboxFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'id' | 'type'> {
  label: ReactNode;
  error?: string;
  id?: string;
}

export function CheckboxField({ label, error, id, ...rest }: CheckboxFieldProps) {
  const generated = useId();
  const fieldId = id ?? generated;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={fieldId} className="inline-flex min-h-tap cursor-pointer items-center gap-3 font-bold">
        <input
          id={fieldId}
          type="checkbox"
          className="size-7 shrink-0 accent-primary"
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${fieldId}-error` : undefined}
          {...rest}
        />
        <span>{label}</span>
      </label>
      <FieldError id={`${fieldId}-error`} message={error} />
    </div>
  );
}
