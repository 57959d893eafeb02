"use client";

import { useEffect, useId, useRef, type ReactNode } from "react";

interface DialogProps {
  open: boolean;
  onClose: () => void;
  title: string;
  description?: ReactNode;
  children: ReactNode;
  testId?: string;
}

/**
 * A modal dialog on the native <dialog> element: showModal() gives focus containment, Escape to close and
 * an inert page behind it. Focus goes to the element marked autoFocus (put it on the safe choice) and
 * back to whatever opened the dialog when it closes.
 */
export function Dialog({ open, onClose, title, description, children, testId }: DialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const opener = useRef<Element | null>(null);
  const titleId = useId();
  const descriptionId = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) {
      opener.current = document.activeElement;
      dialog.showModal();
    } else if (!open && dialog.open) {
      dialog.close();
    }
  }, [open]);

  return (
    <dialog
      ref={ref}
      data-testid={testId}
      aria-labelledby={titleId}
      aria-describedby={description ? descriptionId : undefined}
      onClose={() => {
        if (opener.current instanceof HTMLElement && opener.current.isConnected) opener.current.focus();
        onClose();
      }}
      className="m-auto w-[min(32rem,calc(100vw-2rem))] rounded-lg bg-white p-5 text-slate-900 shadow-xl backdrop:bg-slate-900/60"
    >
      <h2 id={titleId} className="text-lg font-semibold">
        {title}
      </h2>
      {description && (
        <div id={descriptionId} className="mt-2 text-slate-700">
          {description}
        </div>
      )}
      <div className="mt-4">{children}</div>
    </dialog>
  );
}
