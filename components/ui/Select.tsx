// A native select in our style (native keeps the phone and tablet pickers).
import type { Ref, SelectHTMLAttributes } from 'react';
import { controlClasses } from './controlClasses';

export function Select({
  className = '',
  ref,
  children,
  ...rest
}: SelectHTMLAttributes<HTMLSelectElement> & { ref?: Ref<HTMLSelectElement> }) {
  return (
    <select ref={ref} className={`${controlClasses} appearance-auto pr-8 ${className}`} {...rest}>
      {children}
    </select>
  );
}
