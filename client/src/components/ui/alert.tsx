import type { ReactNode } from 'react';

export function ErrorAlert({ children }: { children: ReactNode }) {
  return (
    <div
      role="alert"
      className="flex items-start gap-2 rounded-lg border-4 border-danger bg-surface p-3 font-bold text-danger"
    >
      <span aria-hidden="true">⚠</span>
      <div>{children}</div>
    </div>
  );
}

export function Notice({ children }: { children: ReactNode }) {
  return (
    <div role="status" className="flex items-start gap-2 rounded-lg border-2 border-line bg-surface p-3">
      <span
        aria-hidden="true"
        className="grid size-6 shrink-0 place-items-center rounded-full border-2 border-current text-sm font-bold"
      >
        i
      </span>
      <div>{children}</div>
    </div>
  );
}

export function Loading({ label }: { label: string }) {
  return (
    <p role="status" className="p-4 text-lg">
      {label}
    </p>
  );
}
