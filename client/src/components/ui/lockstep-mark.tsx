/** Lockstep's mark: an "L" with a dot, drawn in the product's own colours. Decorative. */
export function LockstepMark({ size = 28 }: { size?: number }) {
  return (
    <svg width={size} height={size} viewBox="0 0 32 32" aria-hidden focusable="false">
      <rect width="32" height="32" rx="7" fill="var(--mantine-color-lagoon-8)" />
      <path d="M10 8v16h12" fill="none" stroke="#fff" strokeWidth="3.5" strokeLinecap="round" strokeLinejoin="round" />
      <circle cx="21" cy="11" r="3" fill="var(--mantine-color-lagoon-2)" />
    </svg>
  );
}
