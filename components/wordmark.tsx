/** Loamcast's wordmark: a stylised contour swash over the name. Our own mark. */
export function Wordmark({ className = "" }: { className?: string }) {
  return (
    <span className={`inline-flex items-center gap-2 font-extrabold tracking-tight ${className}`}>
      <svg aria-hidden="true" viewBox="0 0 32 32" className="h-7 w-7">
        <rect width="32" height="32" rx="8" fill="#342b21" />
        <path d="M4 22c5-7 9-9 13-6s7 1 11-6" stroke="#f2b12c" strokeWidth="3" fill="none" strokeLinecap="round" />
        <path d="M4 27c6-4 10-5 14-3s6 0 10-3" stroke="#9cc98f" strokeWidth="2" fill="none" strokeLinecap="round" />
      </svg>
      <span>
        loam<span className="text-moss-600">cast</span>
      </span>
    </span>
  );
}
