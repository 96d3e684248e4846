// The Joistwright mark: a deck in section — board ends on a joist, the joist on two pads.
// `tone="light"` puts it on a pale tile so it stands out on the dark spruce bar.
const palettes = {
  dark: { tile: '#1d3a33', boards: '#e3b783', joist: '#c07c3a', pads: '#b8d1c8' },
  light: { tile: '#fcf7f0', boards: '#c07c3a', joist: '#8a4f1f', pads: '#437466' },
} as const;

export function LogoMark({
  size = 32,
  tone = 'dark',
  className,
}: {
  size?: number;
  tone?: 'dark' | 'light';
  className?: string;
}) {
  const c = palettes[tone];
  return (
    <svg
      viewBox="0 0 40 40"
      width={size}
      height={size}
      className={className}
      aria-hidden="true"
      focusable="false"
    >
      <rect width="40" height="40" rx="9" fill={c.tile} />
      <g fill={c.boards}>
        <rect x="7.5" y="9.5" width="5.5" height="5" rx="1" />
        <rect x="14" y="9.5" width="5.5" height="5" rx="1" />
        <rect x="20.5" y="9.5" width="5.5" height="5" rx="1" />
        <rect x="27" y="9.5" width="5.5" height="5" rx="1" />
      </g>
      <rect x="7.5" y="16" width="25" height="6.5" rx="1" fill={c.joist} />
      <g fill={c.pads}>
        <rect x="10" y="24" width="6" height="7.5" rx="1" />
        <rect x="24" y="24" width="6" height="7.5" rx="1" />
      </g>
    </svg>
  );
}
