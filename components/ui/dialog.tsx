"use client";

import { useEffect, useId, useRef, type ReactNode } from "react";
import { Button } from "./button";

export interface DialogProps {
  open: boolean;
  onClose: () => void;
  title: ReactNode;
  children: ReactNode;
  footer?: ReactNode;
}

/**
 * A modal on the native <dialog> element: the browser gives focus trapping, Escape to close and
 * the inert background; we only keep it in step with `open`.
 */
export function Dialog({ open, onClose, title, children, footer }: DialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();

  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    if (open && !el.open) el.showModal();
    if (!open && el.open) el.close();
  }, [open]);

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onClose={onClose}
      onCancel={onClose}
      className="m-auto w-[min(32rem,calc(100vw-2rem))] rounded-panel border border-spruce-200 bg-white p-0 text-graphite-900 shadow-lift backdrop:bg-graphite-900/40"
    >
      <div className="flex items-start justify-between gap-4 border-b border-spruce-100 px-5 py-4">
        <h2 id={titleId} className="text-lg font-semibold">
          {title}
        </h2>
        <Button variant="ghost" size="sm" onClick={onClose} aria-label="Close">
          ✕
        </Button>
      </div>
      <div className="px-5 py-4 text-sm">{children}</div>
      {footer ? <div className="flex justify-end gap-2 border-t border-spruce-100 px-5 py-3">{footer}</div> : null}
    </dialog>
  );
}
