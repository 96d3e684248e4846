// A Next link that looks like a button.
import Link from 'next/link';
import type { ComponentProps } from 'react';
import { buttonClasses, type ButtonSize, type ButtonVariant } from './buttonClasses';

type Props = ComponentProps<typeof Link> & { variant?: ButtonVariant; size?: ButtonSize };

export function ButtonLink({ variant = 'primary', size = 'md', className = '', ...rest }: Props) {
  return <Link className={buttonClasses(variant, size, className)} {...rest} />;
}
