import { useEffect } from 'react';
import { Platform } from 'react-native';

/**
 * While the screen is open, a print stylesheet that leaves only the sheet on paper: the app
 * frame's navigation and the buttons go, and the scroll containers let their whole content print
 * instead of the part that fits the window.
 */
const PRINT_CSS = `@media print {
  [role="navigation"], [role="button"], button, a[href^="/counter"], a[href^="/desk"] { display: none !important; }
  html, body, #root, #root * { overflow: visible !important; height: auto !important; max-height: none !important; }
}`;

export function usePrintSheet(): void {
  useEffect(() => {
    if (Platform.OS !== 'web') return;
    const style = document.createElement('style');
    style.setAttribute('media', 'print');
    style.textContent = PRINT_CSS;
    document.head.appendChild(style);
    return () => style.remove();
  }, []);
}
