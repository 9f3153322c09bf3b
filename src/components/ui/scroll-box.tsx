import type { ReactNode } from 'react';

/**
 * A wide table on a narrow screen: it scrolls inside this box instead of widening the page. The box
 * is a labelled region that takes focus, so the keyboard can scroll it too (WCAG 2.1.1).
 */
export function ScrollBox({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div
      role="region"
      aria-label={label}
      tabIndex={0}
      className="relative max-w-full overflow-x-auto focus-visible:outline-2 focus-visible:outline-oxide-500"
    >
      {children}
    </div>
  );
}
