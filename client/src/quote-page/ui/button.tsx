import type { AnchorHTMLAttributes, ButtonHTMLAttributes, MouseEvent, Ref } from 'react';
import { Spinner } from './spinner';

type Look = {
  /** `filled` (reed, the default), `default` (white, bordered), `clay`, `danger-light`, `subtle`. */
  variant?: 'filled' | 'default' | 'clay' | 'danger-light' | 'subtle';
  size?: 'xs' | 'sm' | 'md';
  /** `phone`: full width below 48em, its own width above. */
  fullWidth?: boolean | 'phone';
};

function lookAttributes({ variant = 'filled', size = 'sm', fullWidth }: Look, className?: string) {
  return {
    className: className ? `qp-button ${className}` : 'qp-button',
    'data-variant': variant === 'filled' ? undefined : variant,
    'data-size': size === 'sm' ? undefined : size,
    'data-full-width': fullWidth === true ? '' : fullWidth || undefined,
  };
}

type ButtonProps = Look &
  ButtonHTMLAttributes<HTMLButtonElement> & {
    /** Waiting for the server: a spinner beside the label, and clicks (and Enter) do nothing. */
    loading?: boolean;
    ref?: Ref<HTMLButtonElement>;
  };

export function Button({
  variant,
  size,
  fullWidth,
  loading,
  className,
  type = 'button',
  onClick,
  children,
  ...rest
}: ButtonProps) {
  // aria-disabled rather than disabled while busy: the button keeps the keyboard focus.
  const click = (event: MouseEvent<HTMLButtonElement>) => {
    if (loading) event.preventDefault();
    else onClick?.(event);
  };
  return (
    <button
      type={type}
      {...lookAttributes({ variant, size, fullWidth }, className)}
      aria-disabled={loading || undefined}
      aria-busy={loading || undefined}
      onClick={click}
      {...rest}
    >
      {loading && <Spinner />}
      {children}
    </button>
  );
}

type ButtonLinkProps = Look & AnchorHTMLAttributes<HTMLAnchorElement>;

/** A link that looks like a button (it goes somewhere rather than doing something). */
export function ButtonLink({ variant, size, fullWidth, className, ...rest }: ButtonLinkProps) {
  return <a {...lookAttributes({ variant, size, fullWidth }, className)} {...rest} />;
}
