import { useEffect, useId, useRef, type ReactNode } from 'react';
import { createPortal } from 'react-dom';

interface DialogProps {
  title: string;
  onClose: () => void;
  children: ReactNode;
  /** 'sheet' rises from the bottom edge on phones; 'centre' sits in the middle. */
  placement?: 'sheet' | 'centre';
}

/** A small modal of our own (plain React, so it behaves the same in tests and browsers). */
export function Dialog({ title, onClose, children, placement = 'centre' }: DialogProps) {
  const titleId = useId();
  const panel = useRef<HTMLDivElement>(null);
  useEffect(() => {
    // Move focus into the dialog unless a control inside asked for it (autoFocus).
    if (panel.current && !panel.current.contains(document.activeElement)) panel.current.focus();
  }, []);
  useEffect(() => {
    const onKey = (event: KeyboardEvent) => {
      if (event.key === 'Escape') onClose();
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [onClose]);

  return createPortal(
    <div className="pl-dialog-backdrop" onClick={onClose}>
      <div
        className={`pl-dialog pl-dialog-${placement}`}
        ref={panel}
        tabIndex={-1}
        role="dialog"
        aria-modal="true"
        aria-labelledby={titleId}
        onClick={(event) => event.stopPropagation()}
      >
        <h2 id={titleId} className="pl-dialog-title">
          {title}
        </h2>
        {children}
      </div>
    </div>,
    document.body,
  );
}
