import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  LABEL_CODE_ALPHABET,
  LABEL_CODE_LENGTH,
  formatLabelCode,
  generateLabelCode,
  isLabelCode,
  labelUrl,
  normaliseLabelCode,
  parseLabelUrl,
} from '@/shared/rules/label-code';

const codeArb = fc
  .array(fc.constantFrom(...LABEL_CODE_ALPHABET.split('')), { minLength: LABEL_CODE_LENGTH, maxLength: LABEL_CODE_LENGTH })
  .map((chars) => chars.join(''));

describe('label code alphabet', () => {
  it('leaves out 0/O and 1/I/L entirely', () => {
    for (const ch of ['0', 'O', '1', 'I', 'L']) expect(LABEL_CODE_ALPHABET).not.toContain(ch);
  });

  it('keeps at most one member of each look-alike group', () => {
    // common practice, no published source: characters commonly misread for one another in print and handwriting
    const groups = [['0', 'O', 'Q', 'D'], ['1', 'I', 'L', '7'], ['5', 'S'], ['2', 'Z'], ['8', 'B'], ['6', 'G'], ['U', 'V']];
    for (const group of groups) {
      const kept = group.filter((ch) => LABEL_CODE_ALPHABET.includes(ch));
      expect(kept.length, `group ${group.join('/')}`).toBeLessThanOrEqual(1);
    }
  });

  it('has distinct upper-case, URL-safe symbols', () => {
    expect(new Set(LABEL_CODE_ALPHABET).size).toBe(LABEL_CODE_ALPHABET.length);
    expect(LABEL_CODE_ALPHABET).toMatch(/^[0-9A-Z]+$/);
  });
});

describe('generateLabelCode', () => {
  it('produces canonical codes of the chosen length', () => {
    for (let i = 0; i < 1000; i++) {
      const code = generateLabelCode();
      expect(code).toHaveLength(LABEL_CODE_LENGTH);
      expect(isLabelCode(code)).toBe(true);
      expect(normaliseLabelCode(code)).toBe(code);
    }
  });

  it('draws 100 000 codes without a collision and with every symbol equally likely', () => {
    // Birthday bound: P(collision) ≈ n² / (2N) = (10^5)² / (2 · 23^12) = 10^10 / 4.38 × 10^16 ≈ 2.3 × 10^-7.
    const n = 100_000;
    const seen = new Set<string>();
    const counts = new Map<string, number>();
    for (let i = 0; i < n; i++) {
      const code = generateLabelCode();
      seen.add(code);
      for (const ch of code) counts.set(ch, (counts.get(ch) ?? 0) + 1);
    }
    expect(seen.size).toBe(n);

    // Binomial count per symbol: mean n·k·p, SD √(n·k·p(1−p)). A plain `byte % 23` without rejection would
    // favour three symbols by 12/256 vs 1/23 (≈ 18 SD here); 6 SD leaves a false alarm below 10^-8 per symbol.
    const draws = n * LABEL_CODE_LENGTH;
    const p = 1 / LABEL_CODE_ALPHABET.length;
    const mean = draws * p;
    const sd = Math.sqrt(draws * p * (1 - p));
    expect(counts.size).toBe(LABEL_CODE_ALPHABET.length);
    for (const [ch, count] of counts) {
      expect(Math.abs(count - mean), `symbol ${ch}`).toBeLessThan(6 * sd);
    }
  });
});

describe('normaliseLabelCode', () => {
  it('accepts what a person types: spaces, hyphens, dashes, lower case, padding', () => {
    expect(normaliseLabelCode('  7kxm-4hap-r2wc ')).toBe('7KXM4HAPR2WC');
    expect(normaliseLabelCode('7KXM 4HAP R2WC')).toBe('7KXM4HAPR2WC');
    expect(normaliseLabelCode('7KXM\u20134HAP\u2013R2WC')).toBe('7KXM4HAPR2WC');
  });

  it('round-trips the display form and lower case for any code', () => {
    fc.assert(
      fc.property(codeArb, (code) => {
        expect(formatLabelCode(code)).toMatch(/^[0-9A-Z]{4}-[0-9A-Z]{4}-[0-9A-Z]{4}$/);
        expect(normaliseLabelCode(formatLabelCode(code))).toBe(code);
        expect(normaliseLabelCode(` ${code.toLowerCase()} `)).toBe(code);
      }),
    );
  });

  it('returns null for wrong length, look-alikes and non-strings', () => {
    expect(normaliseLabelCode('7KXM4HAPR2W')).toBeNull();
    expect(normaliseLabelCode('7KXM4HAPR2WCA')).toBeNull();
    expect(normaliseLabelCode('OKXM4HAPR2WC')).toBeNull();
    expect(normaliseLabelCode('1KXM4HAPR2WC')).toBeNull();
    expect(normaliseLabelCode('7KXM_4HAP_R2WC')).toBeNull();
    expect(normaliseLabelCode('')).toBeNull();
    expect(normaliseLabelCode(null)).toBeNull();
    expect(normaliseLabelCode(123456789012)).toBeNull();
  });

  it('isLabelCode accepts only the canonical form', () => {
    expect(isLabelCode('7KXM4HAPR2WC')).toBe(true);
    expect(isLabelCode('7KXM-4HAP-R2WC')).toBe(false);
    expect(isLabelCode('7kxm4hapr2wc')).toBe(false);
  });

  it('formatLabelCode refuses a non-canonical code', () => {
    expect(() => formatLabelCode('7kxm4hapr2wc')).toThrow();
  });
});

describe('labelUrl', () => {
  it('joins PUBLIC_URL and code with /l/, dropping trailing slashes', () => {
    expect(labelUrl('https://plant.example.org', '7KXM4HAPR2WC')).toBe('https://plant.example.org/l/7KXM4HAPR2WC');
    expect(labelUrl('https://plant.example.org//', '7KXM4HAPR2WC')).toBe('https://plant.example.org/l/7KXM4HAPR2WC');
    expect(labelUrl('https://example.org/isoledger/', '7KXM4HAPR2WC')).toBe('https://example.org/isoledger/l/7KXM4HAPR2WC');
  });

  it('refuses a malformed code rather than printing a dead label', () => {
    expect(() => labelUrl('https://plant.example.org', '7KXM-4HAP-R2WC')).toThrow();
  });
});

describe('parseLabelUrl', () => {
  it('reads the code back from any label URL, whatever host printed it', () => {
    fc.assert(
      fc.property(codeArb, fc.webUrl({ withQueryParameters: false, withFragments: false }), (code, base) => {
        const url = labelUrl(`${new URL(base).origin}`, code);
        expect(parseLabelUrl(url)).toBe(code);
        expect(parseLabelUrl(url, 'https://elsewhere.example.net')).toBe(code);
      }),
    );
  });

  it('tolerates padding, lower case, trailing slash, query and fragment', () => {
    expect(parseLabelUrl('  https://a.example/l/7KXM4HAPR2WC\n')).toBe('7KXM4HAPR2WC');
    expect(parseLabelUrl('http://localhost:8081/l/7kxm4hapr2wc/')).toBe('7KXM4HAPR2WC');
    expect(parseLabelUrl('https://a.example/l/7KXM4HAPR2WC?src=qr#x')).toBe('7KXM4HAPR2WC');
    expect(parseLabelUrl('HTTPS://A.EXAMPLE/l/7KXM-4HAP-R2WC')).toBe('7KXM4HAPR2WC');
  });

  it('accepts the sub-path of the scanning installation only when told it', () => {
    const text = 'https://b.example/isoledger/l/7KXM4HAPR2WC';
    expect(parseLabelUrl(text)).toBeNull();
    expect(parseLabelUrl(text, 'https://b.example/isoledger/')).toBe('7KXM4HAPR2WC');
    expect(parseLabelUrl('https://b.example/other/l/7KXM4HAPR2WC', 'https://b.example/isoledger')).toBeNull();
  });

  it('returns null for foreign and malformed texts', () => {
    const foreign = [
      '7KXM4HAPR2WC',
      'https://a.example/',
      'https://a.example/l/',
      'https://a.example/x/7KXM4HAPR2WC',
      'https://a.example/l/7KXM4HAPR2WC/extra',
      'https://a.example/l/OKXM4HAPR2WC',
      'https://a.example/l/7KXM4HAPR2W',
      'https://a.example/l/%E0%A4%A',
      'ftp://a.example/l/7KXM4HAPR2WC',
      'javascript:alert(1)//l/7KXM4HAPR2WC',
      'WIFI:S:plantroom;T:WPA;P:secret;;',
      'not a url at all',
      '',
    ];
    for (const text of foreign) expect(parseLabelUrl(text), text).toBeNull();
    expect(parseLabelUrl(undefined)).toBeNull();
  });
});
