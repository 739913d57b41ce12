import { useLayoutEffect, useRef, useState, type ReactNode } from 'react';

/**
 * The box a table sits in: it scrolls sideways inside its own border when the table is wider
 * than the screen (the page itself never does), with a shadow at the edge that has more and a
 * line saying so, so nothing looks cut off at 360 px.
 */
export function ScrollBox({ label, children }: { label: string; children: ReactNode }) {
  const box = useRef<HTMLDivElement>(null);
  const [wide, setWide] = useState(false);
  const [atEnd, setAtEnd] = useState(true);
  useLayoutEffect(() => {
    const element = box.current;
    if (!element) return;
    const measure = () => {
      setWide(element.scrollWidth > element.clientWidth + 1);
      setAtEnd(element.scrollLeft + element.clientWidth >= element.scrollWidth - 1);
    };
    measure();
    element.addEventListener('scroll', measure, { passive: true });
    const observer = typeof ResizeObserver === 'undefined' ? null : new ResizeObserver(measure);
    observer?.observe(element);
    return () => {
      element.removeEventListener('scroll', measure);
      observer?.disconnect();
    };
  }, []);
  return (
    <div className="pl-scroll-box">
      <div
        ref={box}
        className={`pl-table-wrap${wide && !atEnd ? ' has-more' : ''}`}
        // A box that scrolls is reachable by keyboard, and named for screen readers.
        tabIndex={wide ? 0 : undefined}
        role={wide ? 'region' : undefined}
        aria-label={wide ? label : undefined}
      >
        {children}
      </div>
      {wide ? (
        <p className="pl-scroll-hint pl-small pl-muted" aria-hidden="true">
          {atEnd ? '← Scroll back for the first columns' : 'Scroll sideways for more columns →'}
        </p>
      ) : null}
    </div>
  );
}
