import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { colorDifferenceCiede2000, hexToLab, nearestThreads } from '../../../server/src/engine/index.ts';

/** The 34 published pairs (fixture copied with its citation header). */
const sharmaPairs = readFileSync(new URL('./fixtures/ciede2000-sharma-2005.tsv', import.meta.url), 'utf8')
  .split('\n')
  .filter((line) => line.trim() !== '' && !line.startsWith('#') && !line.startsWith('pair'))
  .map((line) => line.split('\t').map(Number))
  .map(([pair, l1, a1, b1, l2, a2, b2, deltaE]) => ({
    pair,
    first: { l: l1, a: a1, b: b1 },
    second: { l: l2, a: a2, b: b2 },
    deltaE,
  }));

const palette = [
  { code: 'T-101', name: 'Snow', hex: '#ffffff' },
  { code: 'T-205', name: 'Petal Pink', hex: '#f4a6c0' },
  { code: 'T-206', name: 'Rose Pink', hex: '#e88aa8' },
  { code: 'T-310', name: 'Harbour Blue', hex: '#2f5d8a' },
  { code: 'T-402', name: 'Meadow', hex: '#5a9a4a' },
  { code: 'T-999', name: 'Ink', hex: '#101010' },
];

describe('CIEDE2000', () => {
  it('matches all 34 pairs of Sharma, Wu & Dalal (Color Res. Appl. 30(1), 2005) within 1e-4, in both orders', () => {
    expect(sharmaPairs).toHaveLength(34);
    for (const { first, second, deltaE } of sharmaPairs) {
      expect(Math.abs(colorDifferenceCiede2000(first, second) - deltaE)).toBeLessThan(1e-4);
      expect(Math.abs(colorDifferenceCiede2000(second, first) - deltaE)).toBeLessThan(1e-4);
    }
  });

  it('reads hex colours as D65 Lab, and rejects anything else', () => {
    expect(hexToLab('#ffffff')?.l).toBeCloseTo(100, 3);
    expect(hexToLab('#000')?.l).toBeCloseTo(0, 6);
    expect(hexToLab('red')).toBeUndefined();
    expect(hexToLab('#12345')).toBeUndefined();
  });
});

describe('nearestThreads', () => {
  it('when a pink is requested, then the closest pinks come first with their ΔE', () => {
    const result = nearestThreads('#f2a4bf', palette, 3);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.matches.map((m) => m.thread.code)).toEqual(['T-205', 'T-206', 'T-101']);
    expect(result.matches[0].deltaE).toBeLessThan(1.5);
    expect(result.matches.every((m, i, all) => i === 0 || all[i - 1].deltaE <= m.deltaE)).toBe(true);
  });

  it('when k exceeds the palette, then every thread is returned; an exact match has ΔE 0', () => {
    const result = nearestThreads('#2F5D8A', palette, 50);
    expect(result.ok && result.matches).toHaveLength(palette.length);
    expect(result.ok && result.matches[0]).toEqual({ thread: palette[3], deltaE: 0 });
  });

  it.each([
    ['a colour name', 'pink', palette, 1, /#rrggbb/],
    ['an empty palette', '#ffffff', [], 1, /empty/],
    ['k = 0', '#ffffff', palette, 0, /at least one/],
    ['a bad palette entry', '#ffffff', [...palette, { code: 'T-X', name: 'Broken', hex: 'blue' }], 1, /T-X/],
  ])('when given %s, then it fails with a reason', (_, hex, threads, k, reason) => {
    const result = nearestThreads(hex, threads, k);
    expect(result.ok).toBe(false);
    expect(!result.ok && result.reason).toMatch(reason);
  });
});
