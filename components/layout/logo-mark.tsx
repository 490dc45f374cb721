/** A bearing seen from the side, in brass: the product's mark. */
export function LogoMark({ className = "h-8 w-8" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <circle cx="16" cy="16" r="14" fill="none" stroke="currentColor" strokeWidth="3" />
      <circle cx="16" cy="16" r="6" fill="none" stroke="currentColor" strokeWidth="3" />
      {[0, 60, 120, 180, 240, 300].map((angle) => (
        <circle
          key={angle}
          cx={16 + 10 * Math.cos((angle * Math.PI) / 180)}
          cy={16 + 10 * Math.sin((angle * Math.PI) / 180)}
          r="2.1"
          fill="currentColor"
        />
      ))}
    </svg>
  );
}
