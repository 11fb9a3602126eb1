/** Kerfwise's mark: a panel with one saw kerf through it, the offcut set a kerf apart. */
export function Logo({ className = 'h-7 w-7' }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <rect x="3" y="5" width="17" height="22" rx="1.5" className="fill-oak" />
      <rect x="22.5" y="5" width="6.5" height="22" rx="1.5" className="fill-oak-light" />
      <path d="M7 10h9M7 14h9M7 18h6" className="stroke-oak-wash" strokeWidth="1.4" strokeLinecap="round" />
    </svg>
  );
}
