/**
 * Fizzwright's mark as SVG markup: a squat swing-top bottle drawn as one green shape, three bubbles rising through an
 * amber band (the flavour), and the cap wire as a single stroke. The one drawing both LogoMark files show.
 */
export function logoSvg({ body, hole, brand }: { body: string; hole: string; brand: string }): string {
  return (
    '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 48 48">' +
    `<path d="M19 4h10v8c6 3 9 8 9 14v14a4 4 0 0 1-4 4H14a4 4 0 0 1-4-4V26c0-6 3-11 9-14V4z" fill="${body}"/>` +
    `<rect x="10" y="27" width="28" height="7" fill="${brand}"/>` +
    `<circle cx="20" cy="38" r="2.2" fill="${hole}"/>` +
    `<circle cx="27" cy="31" r="1.8" fill="${hole}"/>` +
    `<circle cx="22" cy="22" r="1.4" fill="${hole}"/>` +
    `<path d="M17 6c-3 0-4 3-2 5" stroke="${body}" stroke-width="2" fill="none" stroke-linecap="round"/>` +
    '</svg>'
  );
}
