import type { ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'secondary' | 'ghost' | 'danger';

const VARIANTS: Record<Variant, string> = {
  primary: 'bg-oxide-500 text-white hover:bg-oxide-600 disabled:bg-concrete-300 disabled:text-concrete-600',
  secondary:
    'border border-concrete-300 bg-white text-concrete-800 hover:bg-concrete-100 disabled:text-concrete-400',
  ghost: 'text-concrete-700 hover:bg-concrete-100 disabled:text-concrete-400',
  danger: 'bg-util-over text-white hover:brightness-95 disabled:bg-concrete-300',
};

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: Variant;
  size?: 'sm' | 'md';
}

/** The one button: oxide for the main action of a screen, concrete for the rest. */
export function Button({
  variant = 'secondary',
  size = 'md',
  className = '',
  type = 'button',
  ...rest
}: ButtonProps) {
  const pad = size === 'sm' ? 'px-2 py-1 text-xs' : 'px-3 py-1.5 text-sm';
  return (
    <button
      type={type}
      className={`inline-flex items-center gap-1.5 rounded font-medium transition-colors focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-oxide-500 disabled:cursor-not-allowed ${pad} ${VARIANTS[variant]} ${className}`}
      {...rest}
    />
  );
}
