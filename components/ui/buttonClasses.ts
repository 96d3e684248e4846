// Shared look of buttons and button-like links: every size keeps a 44 px touch target.
export type ButtonVariant = 'primary' | 'secondary' | 'ghost' | 'danger' | 'accent';
export type ButtonSize = 'md' | 'sm';

const base =
  'inline-flex min-h-11 select-none items-center justify-center gap-2 rounded-lg font-semibold transition-colors ' +
  'disabled:cursor-not-allowed disabled:opacity-55 aria-disabled:cursor-not-allowed aria-disabled:opacity-55';

const variants: Record<ButtonVariant, string> = {
  primary: 'bg-spruce-700 text-white shadow-sm hover:bg-spruce-800 active:bg-spruce-900',
  accent: 'bg-larch-600 text-white shadow-sm hover:bg-larch-700 active:bg-larch-800',
  secondary:
    'border border-ash-300 bg-white text-ash-900 shadow-sm hover:border-ash-400 hover:bg-ash-50 active:bg-ash-100',
  ghost: 'text-spruce-800 hover:bg-spruce-50 active:bg-spruce-100',
  danger: 'bg-clay-600 text-white shadow-sm hover:bg-clay-700 active:bg-clay-800',
};

const sizes: Record<ButtonSize, string> = {
  md: 'px-4 text-[0.95rem]',
  sm: 'px-3 text-sm',
};

/** Class list for a button or a link styled as one. */
export function buttonClasses(
  variant: ButtonVariant = 'primary',
  size: ButtonSize = 'md',
  extra = '',
): string {
  return `${base} ${variants[variant]} ${sizes[size]} ${extra}`.trim();
}
