// A small drawing of the deck outline (plan view, y up) with its overall size, for quotes and proposals.
export function PlanPreview({
  outline,
  className = '',
}: {
  outline: [number, number][] | null;
  className?: string;
}) {
  if (!outline || outline.length < 3)
    return <p className="text-sm text-ash-600">No plan is attached to this quote.</p>;
  const xs = outline.map((p) => p[0]);
  const ys = outline.map((p) => p[1]);
  const minX = Math.min(...xs);
  const maxX = Math.max(...xs);
  const minY = Math.min(...ys);
  const maxY = Math.max(...ys);
  const w = Math.max(1, maxX - minX);
  const h = Math.max(1, maxY - minY);
  const pad = Math.max(w, h) * 0.06;
  const points = outline.map(([x, y]) => `${x - minX},${maxY - y}`).join(' ');
  return (
    <figure className={className}>
      <svg
        viewBox={`${-pad} ${-pad} ${w + 2 * pad} ${h + 2 * pad}`}
        className="h-auto w-full max-w-md"
        role="img"
        aria-label={`Deck outline, about ${(w / 1000).toFixed(2)} m by ${(h / 1000).toFixed(2)} m`}
      >
        <polygon
          points={points}
          fill="#ebe4d6"
          stroke="#3a3a36"
          strokeWidth={Math.max(w, h) / 200}
          strokeLinejoin="round"
        />
      </svg>
      <figcaption className="mt-1 text-sm text-ash-600">
        Deck outline, about {(w / 1000).toFixed(2)} m × {(h / 1000).toFixed(2)} m
      </figcaption>
    </figure>
  );
}
