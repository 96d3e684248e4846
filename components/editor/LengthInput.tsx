'use client';
// A length field: shows mm or feet-inches per the user's units, accepts either as typed (site tape first).
import { useState, type InputHTMLAttributes } from 'react';
import { controlClasses } from '@/components/ui/controlClasses';
import { formatLength, parseLength, type UnitSystem } from '@/lib/units';

type Props = Omit<InputHTMLAttributes<HTMLInputElement>, 'value' | 'onChange'> & {
  valueMm: number | null;
  units: UnitSystem;
  /** Called with the parsed length when the user finishes typing (Enter or leaving the field). */
  onCommit: (mm: number) => void;
  /** Called with the parsed length (or null) on every keystroke, for forms that submit with a button. */
  onDraft?: (mm: number | null) => void;
};

export function LengthInput({ valueMm, units, onCommit, onDraft, className = '', ...rest }: Props) {
  const shown = valueMm === null ? '' : formatLength(valueMm, units).replace(/\u2009/g, '');
  // While the user types, their text wins; otherwise the field follows the document (undo, a drag).
  const [draft, setDraft] = useState<string | null>(null);
  const [bad, setBad] = useState(false);
  const text = draft ?? shown;

  const commit = () => {
    const typed = draft;
    setDraft(null);
    if (typed === null || typed.trim() === shown) return;
    const mm = parseLength(typed, units);
    if (mm === null || !(mm > 0)) {
      setBad(true);
      setDraft(typed);
      return;
    }
    setBad(false);
    onCommit(mm);
  };

  return (
    <input
      {...rest}
      inputMode="text"
      autoComplete="off"
      spellCheck={false}
      className={`${controlClasses} ${className}`}
      aria-invalid={bad || undefined}
      value={text}
      onChange={(e) => {
        setDraft(e.target.value);
        const mm = parseLength(e.target.value, units);
        setBad(false);
        onDraft?.(mm !== null && mm > 0 ? mm : null);
      }}
      onBlur={commit}
      onKeyDown={(e) => {
        if (e.key === 'Enter') {
          e.preventDefault();
          commit();
        }
      }}
    />
  );
}
