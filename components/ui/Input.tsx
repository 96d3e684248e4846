// A text input in our style.
import type { InputHTMLAttributes, Ref } from 'react';
import { controlClasses } from './controlClasses';

export function Input({
  className = '',
  ref,
  ...rest
}: InputHTMLAttributes<HTMLInputElement> & { ref?: Ref<HTMLInputElement> }) {
  return <input ref={ref} className={`${controlClasses} ${className}`} {...rest} />;
}
