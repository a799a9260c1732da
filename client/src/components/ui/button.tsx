import type { ButtonHTMLAttributes } from 'react';

export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'quiet';
export type ButtonSize = 'normal' | 'large';

const base =
  'inline-flex min-h-tap min-w-tap items-center justify-center gap-2 rounded-lg px-4 py-2 text-center font-bold ' +
  'no-underline transition-colors disabled:cursor-not-allowed disabled:opacity-70';

const variants: Record<ButtonVariant, string> = {
  primary: 'border-2 border-primary bg-primary text-on-primary hover:brightness-110',
  secondary: 'border-2 border-line bg-surface text-ink hover:border-ink',
  danger: 'border-2 border-danger bg-surface text-danger hover:bg-page',
  quiet: 'border-2 border-transparent text-ink underline hover:border-line',
};

const sizes: Record<ButtonSize, string> = {
  normal: 'text-base',
  // The driver's one main action: big enough to hit with a gloved thumb without looking twice.
  large: 'min-h-[max(6rem,var(--yc-tap))] w-full px-6 text-2xl',
};

export function buttonClassName(variant: ButtonVariant = 'primary', size: ButtonSize = 'normal', extra = ''): string {
  return `${base} ${variants[variant]} ${sizes[size]} ${extra}`.trim();
}

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  size?: ButtonSize;
  busy?: boolean;
}

export function Button({
  variant,
  size,
  busy = false,
  className = '',
  type = 'button',
  children,
  disabled,
  ...rest
}: ButtonProps) {
  return (
    <button
      type={type}
      className={buttonClassName(variant, size, className)}
      disabled={disabled ?? busy}
      aria-busy={busy || undefined}
      {...rest}
    >
      {children}
    </button>
  );
}
