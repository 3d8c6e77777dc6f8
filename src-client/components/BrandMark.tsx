export interface BrandMarkProps {
  /** Edge length in px. @default 28 */
  size?: number;
}

/** Bandwright's mark: three band bars over a frequency axis. */
export function BrandMark({ size = 28 }: BrandMarkProps) {
  return (
    <svg width={size} height={size} viewBox="0 0 32 32" aria-hidden="true" className="bw-brandmark">
      <rect width="32" height="32" rx="7" className="bw-brandmark__tile" />
      <path d="M6 22h4V12H6zm8 0h4V6h-4zm8 0h4V16h-4z" className="bw-brandmark__bars" />
      <path d="M4 26h24" className="bw-brandmark__axis" strokeWidth="2" />
    </svg>
  );
}
