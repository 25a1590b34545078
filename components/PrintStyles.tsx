import { useEffect } from 'react';
import { Platform } from 'react-native';
import { palettes } from '../theme';

/** testIDs the print stylesheet hooks onto (react-native-web renders them as data-testid). */
export const PRINT_IDS = {
  sheet: 'pit-sheet',
  columns: 'pit-columns',
  section: 'pit-section',
  hide: 'pit-hide',
} as const;

const id = (name: keyof typeof PRINT_IDS) => `[data-testid="${PRINT_IDS[name]}"]`;

// Paper is always light: the light palette's ink and surface, whatever the screen's scheme.
const INK = palettes.light.text;
const PAPER = palettes.light.surface;

/**
 * Print rules. The app lives inside fixed-height scrolling boxes, which would print as one clipped
 * page, so every box that contains the sheet is let out to its full height when printing.
 */
export const PRINT_CSS = `
@media print {
  @page { margin: 8mm; }
  html, body, #root { height: auto !important; overflow: visible !important; background: ${PAPER} !important; }
  *:has(${id('sheet')}), ${id('sheet')} {
    display: block !important; position: static !important;
    width: auto !important; max-width: none !important; min-width: 0 !important;
    height: auto !important; max-height: none !important; min-height: 0 !important;
    overflow: visible !important; margin: 0 !important; padding: 0 !important;
    background: ${PAPER} !important;
  }
  ${id('hide')} { display: none !important; }
  ${id('sheet')} > * { margin-bottom: 3mm; }
  ${id('sheet')}, ${id('sheet')} * {
    color: ${INK} !important; background: ${PAPER} !important; border-color: ${INK} !important;
    box-shadow: none !important;
  }
  /* Small print so a whole sheet fits the pit table: ~100 fields in two columns. */
  ${id('sheet')} * { font-size: 7pt !important; line-height: 1.25 !important; }
  ${id('sheet')} [aria-level="1"] { font-size: 14pt !important; }
  ${id('sheet')} [aria-level="2"] { font-size: 9pt !important; }
  ${id('columns')} { display: block !important; column-count: 2; column-gap: 6mm; }
  ${id('section')} {
    break-inside: avoid; page-break-inside: avoid; width: auto !important;
    margin: 0 0 2mm 0 !important; padding: 1mm 2mm !important; gap: 0 !important;
  }
  ${id('sheet')} [role="note"] { break-inside: avoid; page-break-inside: avoid; padding: 1mm 2mm !important; }
  ${id('section')} [role="row"] { padding-top: 0.3mm !important; padding-bottom: 0.3mm !important; }
}
`;

/** Puts the print rules on the page while the pit sheet is open; nothing on other platforms. */
export function PrintStyles() {
  useEffect(() => {
    if (Platform.OS !== 'web' || typeof document === 'undefined') return;
    const style = document.createElement('style');
    style.setAttribute('data-tunefork', 'print');
    style.textContent = PRINT_CSS;
    document.head.appendChild(style);
    return () => style.remove();
  }, []);
  return null;
}

/** Opens the browser's print dialog. */
export function printPage(): void {
  if (Platform.OS === 'web' && typeof window !== 'undefined') window.print();
}
