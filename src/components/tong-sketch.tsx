/**
 * A decorative free-body sketch of a scissor tong holding a block: links in ink,
 * pins as open circles, and every force in the signal colour.
 */
export function TongSketch({ className = '' }: { className?: string }) {
  const arrowId = 'tong-sketch-arrow';
  return (
    <svg
      viewBox="0 0 320 300"
      className={className}
      role="img"
      aria-labelledby="tong-sketch-title"
    >
      <title id="tong-sketch-title">
        Sketch of a scissor tong: the lifting force W at the eye, the jaw forces N pressing the
        block from both sides.
      </title>
      <defs>
        <marker id={arrowId} viewBox="0 0 10 10" refX="8" refY="5" markerWidth="5" markerHeight="5" orient="auto-start-reverse">
          <path d="M0 0 L10 5 L0 10 z" className="fill-signal-500" />
        </marker>
        <pattern id="tong-sketch-grid" width="20" height="20" patternUnits="userSpaceOnUse">
          <path d="M20 0 L0 0 0 20" fill="none" className="stroke-ink-100" strokeWidth="1" />
        </pattern>
      </defs>
      <rect x="1" y="1" width="318" height="298" rx="16" fill="url(#tong-sketch-grid)" className="stroke-ink-200" strokeWidth="1.5" />

      {/* the block being lifted */}
      <rect x="112" y="206" width="96" height="62" rx="3" className="fill-paper-300 stroke-ink-400" strokeWidth="1.5" />
      <text x="160" y="243" textAnchor="middle" className="fill-ink-700 text-[11px] font-semibold">load</text>

      {/* upper links from the eye to the arm heads */}
      <g className="stroke-ink-700" strokeWidth="7" strokeLinecap="round" fill="none">
        <path d="M160 62 L110 104" />
        <path d="M160 62 L210 104" />
      </g>
      {/* the two crossing arms, each ending in a jaw */}
      <g className="stroke-ink-900" strokeWidth="9" strokeLinecap="round" strokeLinejoin="round" fill="none">
        <path d="M110 104 L160 150 L222 200 L212 224" />
        <path d="M210 104 L160 150 L98 200 L108 224" />
      </g>

      {/* pins */}
      <g className="fill-paper-50 stroke-ink-900" strokeWidth="2.5">
        <circle cx="160" cy="62" r="6" />
        <circle cx="110" cy="104" r="6" />
        <circle cx="210" cy="104" r="6" />
        <circle cx="160" cy="150" r="7" />
      </g>

      {/* forces */}
      <g className="stroke-signal-500" strokeWidth="3" markerEnd={`url(#${arrowId})`}>
        <line x1="160" y1="54" x2="160" y2="14" />
        <line x1="74" y1="224" x2="104" y2="224" />
        <line x1="246" y1="224" x2="216" y2="224" />
      </g>
      <g className="fill-signal-700 text-[14px] font-bold">
        <text x="172" y="28">W</text>
        <text x="70" y="214">N</text>
        <text x="238" y="214">N</text>
      </g>
      <text x="174" y="156" className="fill-ink-600 text-[11px] font-semibold">pin</text>
    </svg>
  );
}
