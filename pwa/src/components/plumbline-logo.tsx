interface PlumblineLogoProps {
  size?: number;
  /** Show the word "Plumbline" beside the mark. */
  withName?: boolean;
}

/** The plumb bob on its line above a level mark: fieldwork kept level. */
export function PlumblineLogo({ size = 32, withName = false }: PlumblineLogoProps) {
  return (
    <span className="pl-logo">
      <svg width={size} height={size} viewBox="0 0 64 64" aria-hidden="true" focusable="false">
        <rect width="64" height="64" rx="14" fill="var(--pl-teal)" />
        <line x1="32" y1="7" x2="32" y2="31" stroke="var(--pl-paper)" strokeWidth="2.6" strokeLinecap="round" />
        <rect x="27.5" y="29.5" width="9" height="4.5" rx="1.2" fill="var(--pl-brass)" />
        <path d="M22.5 34 H41.5 L33.2 53.2 Q32 55.6 30.8 53.2 Z" fill="var(--pl-brass)" />
        <line x1="20" y1="58" x2="44" y2="58" stroke="var(--pl-paper)" strokeWidth="2.6" strokeLinecap="round" opacity="0.85" />
      </svg>
      {withName ? <span className="pl-logo-name">Plumbline</span> : null}
    </span>
  );
}
