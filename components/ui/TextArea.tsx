// A multi-line text input in our style.
import type { Ref, TextareaHTMLAttributes } from 'react';
import { controlClasses } from './controlClasses';

export function TextArea({
  className = '',
  ref,
  rows = 4,
  ...rest
}: TextareaHTMLAttributes<HTMLTextAreaElement> & { ref?: Ref<HTMLTextAreaElement> }) {
  return <textarea ref={ref} rows={rows} className={`${controlClasses} ${className}`} {...rest} />;
}
