import type { ReactNode } from 'react';
import { Link, type LinkProps } from 'react-router';
import { buttonClassName, type ButtonSize, type ButtonVariant } from './button';

// Apart from Button so that a page without the router (the glove screen's own page) can use buttons.
export interface LinkButtonProps extends LinkProps {
  variant?: ButtonVariant;
  size?: ButtonSize;
  children: ReactNode;
}

export function LinkButton({ variant, size, className = '', children, ...rest }: LinkButtonProps) {
  return (
    <Link className={buttonClassName(variant, size, typeof className === 'string' ? className : '')} {...rest}>
      {children}
    </Link>
  );
}
