import type { ReactNode } from 'react';
import { cx } from '../../lib/cx';

export interface PageProps {
  /** the page's h1, also the document title */
  title: string;
  /** a short paragraph under the heading saying what the page is for */
  description?: ReactNode;
  /** buttons beside the heading */
  actions?: ReactNode;
  /** narrow pages (forms) keep a readable line length */
  width?: 'narrow' | 'wide';
  children?: ReactNode;
}

export function Page({ title, description, actions, width = 'wide', children }: PageProps) {
  return (
    <div className={cx('mx-auto flex w-full flex-col gap-8', width === 'narrow' ? 'max-w-measure' : 'max-w-shell')}>
      <title>{`${title} · Hearthswap`}</title>
      <header className="flex flex-wrap items-end justify-between gap-4">
        <div className="flex max-w-measure flex-col gap-2">
          <h1 className="text-3xl font-black tracking-tight text-ink sm:text-4xl">{title}</h1>
          {description && <p className="text-lg leading-relaxed text-ink-soft">{description}</p>}
        </div>
        {actions && <div className="flex flex-wrap gap-2">{actions}</div>}
      </header>
      {children}
    </div>
  );
}
