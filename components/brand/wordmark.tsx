import Link from "next/link";

/** Our mark: a segmented bar in cocoa and pod amber, and the name. */
export function Wordmark({ href = "/" }: { href?: string }) {
  return (
    <Link href={href} className="inline-flex items-center gap-2.5 font-bold tracking-tight text-cocoa">
      <svg width="26" height="18" viewBox="0 0 26 18" aria-hidden="true">
        <rect x="0.5" y="0.5" width="25" height="17" rx="3" fill="#2B1A12" />
        <rect x="3" y="3" width="5.5" height="5" rx="1" fill="#C4711F" />
        <rect x="10.25" y="3" width="5.5" height="5" rx="1" fill="#C4711F" />
        <rect x="17.5" y="3" width="5.5" height="5" rx="1" fill="#C4711F" />
        <rect x="3" y="10" width="5.5" height="5" rx="1" fill="#C4711F" opacity="0.7" />
        <rect x="10.25" y="10" width="5.5" height="5" rx="1" fill="#C4711F" opacity="0.7" />
        <rect x="17.5" y="10" width="5.5" height="5" rx="1" fill="#C4711F" opacity="0.7" />
      </svg>
      <span className="text-lg">Barwright</span>
    </Link>
  );
}
