/** The product's mark: a counterbored mouth seen from above — an outer ring, a cut ring, the bore. */
export function Mark({ size = 28 }: { size?: number }) {
  return (
    <svg width={size} height={size} viewBox="0 0 32 32" aria-hidden="true">
      <circle cx="16" cy="16" r="14" fill="none" stroke="currentColor" strokeWidth="2" />
      <circle cx="16" cy="16" r="9.5" fill="none" stroke="var(--color-accent)" strokeWidth="2.5" />
      <circle cx="16" cy="16" r="5" fill="currentColor" />
      {[45, 135, 225, 315].map((a) => (
        <circle key={a} cx={16 + 12 * Math.cos((a * Math.PI) / 180)} cy={16 + 12 * Math.sin((a * Math.PI) / 180)} r="1.4" fill="currentColor" />
      ))}
    </svg>
  );
}
