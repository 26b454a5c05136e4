/** Text helpers of the report: escaping and number formatting for HTML. */

const ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/** Escapes text for HTML element content and double- or single-quoted attribute values. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ESCAPES[c]!);
}

/** A fragment id for a species: `sp-` plus the name with anything outside [A-Za-z0-9_-] hex-encoded. */
export function anchorId(name: string): string {
  let out = 'sp-';
  for (const ch of name) out += /[A-Za-z0-9_-]/.test(ch) ? ch : `.${ch.codePointAt(0)!.toString(16)}`;
  return out;
}

/** Significant-figure formatting that never prints "-0" and prints exponents for very small values. */
export function sig(x: number | undefined, digits = 3): string {
  if (x === undefined || !Number.isFinite(x)) return '–';
  if (x === 0) return '0';
  const a = Math.abs(x);
  const s = a >= 1e-3 && a < 1e6 ? Number(x.toPrecision(digits)).toString() : x.toExponential(digits - 1);
  return s === '-0' ? '0' : s.replace('-', '−');
}
