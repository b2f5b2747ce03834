import { useCallback, useEffect, useState } from 'react';
import { flushSync } from 'react-dom';

/*
 * While a page that renders <PrintSheetStyle /> is open, printing drops the site's header, navigation,
 * footer, skip link, toasts and anything marked print:hidden. While usePrintPart prints one part,
 * the other parts (each marked with its partProps) stay off the paper.
 */
const PRINT_CSS = `
@media print {
  @page { margin: 14mm; }
  html, body { background: #ffffff !important; }
  #root > div > header, #root > div > footer, #root nav, a[href="#main"], [role="progressbar"], #root > [aria-live] { display: none !important; }
  #main { padding: 0 !important; max-width: none !important; }
  img { print-color-adjust: exact; -webkit-print-color-adjust: exact; }
  [data-print-only] [data-print-part]:not([data-print-chosen]) { display: none !important; }
}
`;

/** The print stylesheet for pages meant to be printed; mount it once on the page. */
export function PrintSheetStyle() {
  return <style>{PRINT_CSS}</style>;
}

/**
 * Print the whole page (`print()`) or only one part of it (`print('shopping')`). Spread `wrapperProps`
 * on an element around all the parts and `partProps(name)` on each part.
 */
export function usePrintPart<Part extends string>() {
  const [only, setOnly] = useState<Part | null>(null);

  useEffect(() => {
    const reset = () => setOnly(null);
    window.addEventListener('afterprint', reset);
    return () => window.removeEventListener('afterprint', reset);
  }, []);

  const print = useCallback((part?: Part) => {
    // The attribute must be in the DOM before the print dialog takes its snapshot.
    flushSync(() => setOnly(part ?? null));
    window.print();
  }, []);

  const wrapperProps = { 'data-print-only': only ?? undefined };
  const partProps = useCallback((part: Part) => ({ 'data-print-part': part, 'data-print-chosen': only === part ? '' : undefined }), [only]);
  return { only, print, wrapperProps, partProps };
}
