import { describe, expect, it } from 'vitest';
import { DEMO_EQUIVALENTS } from './equivalents';
import { DEMO_PARTS } from './parts';

// Self-consistency checks on invented demo data; no external reference applies.

const byNumber = new Map(DEMO_PARTS.map((p) => [p.partNumber, p]));

describe('demo rulings on equivalents', () => {
  it('name parts of the demo catalog, two of the same family each time', () => {
    for (const e of DEMO_EQUIVALENTS) {
      const a = byNumber.get(e.a);
      const b = byNumber.get(e.b);
      expect(a, e.a).toBeDefined();
      expect(b, e.b).toBeDefined();
      expect(a!.family, `${e.a} / ${e.b}`).toBe(b!.family);
    }
  });

  it('approve a stand-in that is still made for every obsolete original they name', () => {
    for (const e of DEMO_EQUIVALENTS.filter((x) => x.status === 'approved')) {
      const [original, standIn] = [byNumber.get(e.a)!, byNumber.get(e.b)!];
      expect(original.lifecycle, e.a).toBe('obsolete');
      expect(standIn.lifecycle ?? 'active', e.b).toBe('active');
    }
  });

  it('never rule twice on the same pair for the same use', () => {
    const keys = DEMO_EQUIVALENTS.map((e) => [[e.a, e.b].sort().join('|'), e.use.toLowerCase()].join('|'));
    expect(new Set(keys).size).toBe(keys.length);
  });
});
