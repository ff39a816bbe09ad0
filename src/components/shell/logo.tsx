/** Guyline's mark: a mast with its guys and a copper dipole across the top, fed at the centre. */
export function Logo({ size = 32 }: { size?: number }) {
  return (
    <svg width={size} height={size} viewBox="0 0 64 64" aria-hidden="true" focusable="false">
      <rect width="64" height="64" rx="12" fill="#1e293b" />
      <path d="M32 10v44" stroke="#cbd5e1" strokeWidth="3" strokeLinecap="round" />
      <path d="M32 14 12 52M32 14l20 38" stroke="#94a3b8" strokeWidth="1.5" strokeDasharray="3 3" />
      <path d="M8 20h48" stroke="#d08447" strokeWidth="3" strokeLinecap="round" />
      <circle cx="8" cy="20" r="3" fill="#dfa271" />
      <circle cx="56" cy="20" r="3" fill="#dfa271" />
      <circle cx="32" cy="20" r="4" fill="#1e293b" stroke="#d08447" strokeWidth="2" />
    </svg>
  );
}
