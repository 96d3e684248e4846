// The mark plus the wordmark; `tone="light"` for dark backgrounds.
import { LogoMark } from './LogoMark';

export function Logo({
  size = 32,
  tone = 'dark',
  className = '',
}: {
  size?: number;
  tone?: 'dark' | 'light';
  className?: string;
}) {
  const joist = tone === 'dark' ? 'text-spruce-900' : 'text-white';
  const wright = tone === 'dark' ? 'text-larch-700' : 'text-larch-300';
  return (
    <span className={`inline-flex items-center gap-2.5 ${className}`}>
      <LogoMark size={size} tone={tone} />
      <span className="leading-none tracking-tight" style={{ fontSize: size * 0.6 }}>
        <span className={`font-bold ${joist}`}>Joist</span>
        <span className={`font-medium ${wright}`}>wright</span>
      </span>
    </span>
  );
}
