/** Sproutline's mark: two seed leaves on a stem over a line of soil. Decorative. */
export function SproutMark({ className = "size-8" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" aria-hidden="true" focusable="false" className={className}>
      <path d="M4 27h24" stroke="#7a4a24" strokeWidth="3" strokeLinecap="round" />
      <path d="M16 26V15" stroke="#1f5a36" strokeWidth="2.5" strokeLinecap="round" />
      <path d="M16 16C16 10 12 6 5 6c0 6 4 10 11 10Z" fill="#1f5a36" />
      <path d="M16 14c0-5 3.5-8.5 10-8.5 0 5.5-3.5 8.5-10 8.5Z" fill="#4f8a3c" />
    </svg>
  );
}
