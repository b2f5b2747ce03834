import type { ElementType, ReactNode } from 'react';
import { cx } from '../../lib/cx';

export interface CardProps {
  /** heading of the card; rendered as h2 unless headingLevel says otherwise */
  title?: ReactNode;
  headingLevel?: 2 | 3;
  description?: ReactNode;
  /** buttons or links in the card's top right */
  actions?: ReactNode;
  as?: ElementType;
  className?: string;
  children?: ReactNode;
}

export function Card({ title, headingLevel = 2, description, actions, as: Tag = 'section', className, children }: CardProps) {
  const Heading = headingLevel === 2 ? 'h2' : 'h3';
  return (
    <Tag className={cx('rounded-card border border-line bg-surface p-5 shadow-card sm:p-6', className)}>
      {(title || actions) && (
        <div className="mb-4 flex flex-wrap items-start justify-between gap-3">
          <div className="flex flex-col gap-1">
            {title && <Heading className="text-xl font-extrabold text-ink">{title}</Heading>}
            {description && <p className="text-ink-soft">{description}</p>}
          </div>
          {actions && <div className="flex flex-wrap gap-2">{actions}</div>}
        </div>
      )}
      {children}
    </Tag>
  );
}
