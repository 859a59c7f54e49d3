/**
 * Display width of a line in columns, as the specification measures title adornments: East Asian
 * wide and full-width characters count two, combining marks none, everything else one.
 */

const WIDE = /[\u1100-\u115f\u231a\u231b\u2329\u232a\u2e80-\u303e\u3041-\u33ff\u3400-\u4dbf\u4e00-\u9fff\ua000-\ua4cf\ua960-\ua97f\uac00-\ud7a3\uf900-\ufaff\ufe10-\ufe19\ufe30-\ufe6f\uff00-\uff60\uffe0-\uffe6\u{1f300}-\u{1f64f}\u{1f900}-\u{1f9ff}\u{20000}-\u{2fffd}\u{30000}-\u{3fffd}]/u;
const COMBINING = /\p{M}/u;

export function columnWidth(text: string): number {
  let width = 0;
  for (const c of text) {
    if (COMBINING.test(c)) continue;
    width += WIDE.test(c) ? 2 : 1;
  }
  return width;
}
