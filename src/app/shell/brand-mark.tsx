/** The Hearthswap mark: a flame rising from a pot. Decorative; the wordmark beside it names the site. */
export function BrandMark({ className }: { className?: string }) {
  return (
    <svg aria-hidden="true" viewBox="0 0 32 32" className={className} fill="none">
      <path
        d="M16 3c1.2 3.4 5.5 5.6 5.5 10.2A5.5 5.5 0 0 1 16 18.7a5.5 5.5 0 0 1-5.5-5.5c0-2.2 1-3.6 2.1-4.7.2 1.7 1 2.8 2.1 3.2C14.4 8.6 15 5.6 16 3Z"
        className="fill-ember-500"
      />
      <path d="M16 18.7a2.6 2.6 0 0 1-2.6-2.6c0-1.6 1.5-2.4 2.6-4.3 1.1 1.9 2.6 2.7 2.6 4.3a2.6 2.6 0 0 1-2.6 2.6Z" className="fill-honey-200" />
      <path d="M4 20h24v1.5A8.5 8.5 0 0 1 19.5 30h-7A8.5 8.5 0 0 1 4 21.5V20Z" className="fill-herb-700" />
      <path d="M2 20h28" className="stroke-herb-800" strokeWidth="2.2" strokeLinecap="round" />
    </svg>
  );
}
