// The print views' one script: the Print button (inline handlers are blocked by the CSP).
document.querySelectorAll('[data-print]').forEach((b) => b.addEventListener('click', () => window.print()));
