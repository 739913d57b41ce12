import { useEffect, useId, type ReactNode } from 'react';
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
