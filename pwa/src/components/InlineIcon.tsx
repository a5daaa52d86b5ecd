/** The SVG markup inside one of ionicons' `data:image/svg+xml;utf8,<svg …>` icon constants. */
function svgMarkup(icon: string): string {
  const start = icon.indexOf('<svg');
  if (!icon.startsWith('data:image/svg+xml') || start < 0) throw new TypeError('InlineIcon takes one of the ionicons SVG data URLs');
  return icon.slice(start);
}

/**
 * An ionicons icon drawn inline in the text colour, without Ionic's `ion-icon` web component: for
 * the screens drawn before sign-in, which load no Ionic code. The icon constants come from the
 * `ionicons/icons` package itself, never from outside input; `.sb-icon` in shell.css gives their
 * classes the stroke and fill `ion-icon` would.
 */
export function InlineIcon({ icon }: { icon: string }) {
  return <span className="sb-icon" aria-hidden="true" dangerouslySetInnerHTML={{ __html: svgMarkup(icon) }} />;
}
