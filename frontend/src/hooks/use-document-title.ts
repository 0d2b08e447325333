import { useEffect } from 'react';

/** Names the browser tab after the page (WCAG 2.4.2), so tabs and history entries tell pages apart. */
export function useDocumentTitle(title: string): void {
  useEffect(() => {
    document.title = title ? `${title} · Causeway` : 'Causeway';
  }, [title]);
}
