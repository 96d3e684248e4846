// The Joistwright mark: a deck in section — board ends on a joist, the joist on two pads.
export function LogoMark({ size = 32, className }: { size?: number; className?: string }) {
  return (
    <svg
      viewBox="0 0 40 40"
      width={size}
      height={size}
      className={className}
      aria-hidden="true"
      focusable="false"
    >
      <rect width="40" height="40" rx="9" fill="#1d3a33" />
      <g fill="#e3b783">
        <rect x="7.5" y="9.5" width="5.5" height="5" rx="1" />
        <rect x="14" y="9.5" width="5.5" height="5" rx="1" />
        <rect x="20.5" y="9.5" width="5.5" height="5" rx="1" />
        <rect x="27" y="9.5" width="5.5" height="5" rx="1" />
      </g>
      <rect x="7.5" y="16" width="25" height="6.5" rx="1" fill="#c07c3a" />
      <g fill="#b8d1c8">
        <rect x="10" y="24" width="6" height="7.5" rx="1" />
        <rect x="24" y="24" width="6" height="7.5" rx="1" />
      </g>
    </svg>
  );
}
