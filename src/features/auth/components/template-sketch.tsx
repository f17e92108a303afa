/**
 * A drafted collar blank in line work, as it would appear on a paper template: buckle end
 * with its fold and tongue slot on the left, five adjustment holes, a rounded tip, and the
 * dimension line from the datum. Purely decorative.
 */
export function TemplateSketch({ className }: { className?: string }) {
  const holes = [232, 250, 268, 286, 304];
  return (
    <svg viewBox="0 0 400 120" className={className} aria-hidden="true" focusable="false" fill="none" stroke="currentColor">
      <path d="M12 40h348a20 20 0 0 1 0 40H12z" strokeWidth="1.6" />
      <path d="M20 46h340M20 74h340" strokeWidth="0.8" strokeDasharray="2 3" opacity="0.6" />
      <path d="M64 34v52" strokeWidth="1.2" strokeDasharray="6 4" />
      <rect x="34" y="57" width="20" height="6" rx="3" strokeWidth="1.2" />
      {holes.map((x) => (
        <circle key={x} cx={x} cy="60" r="3.2" strokeWidth="1.2" />
      ))}
      <circle cx="92" cy="60" r="2.4" strokeWidth="1.2" />
      <circle cx="110" cy="60" r="2.4" strokeWidth="1.2" />
      <path d="M12 100v10M268 100v10M12 105h256" strokeWidth="0.9" />
      <path d="M262 102l6 3-6 3" strokeWidth="0.9" />
      <text x="140" y="100" fontSize="9" fill="currentColor" stroke="none" textAnchor="middle" fontFamily="inherit">
        buckle end to middle hole
      </text>
      <text x="64" y="28" fontSize="9" fill="currentColor" stroke="none" textAnchor="middle" fontFamily="inherit">
        fold
      </text>
    </svg>
  );
}
