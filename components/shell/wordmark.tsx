import Link from 'next/link';

export function Wordmark({ href = '/' }: { href?: string }) {
  return (
    <Link href={href} className="inline-flex items-center gap-2 font-semibold tracking-tight text-graphite" aria-label="Antinode home">
      <svg aria-hidden="true" width="22" height="22" viewBox="0 0 32 32">
        <rect width="32" height="32" rx="6" fill="#25282d" />
        <path d="M4 16c3-9 5-9 6 0s3 9 6 0 3-9 6 0 3 9 6 0" fill="none" stroke="#f7f6f2" strokeWidth="2.2" strokeLinecap="round" />
        <circle cx="7" cy="16" r="2" fill="#b5541b" />
      </svg>
      Antinode
    </Link>
  );
}
