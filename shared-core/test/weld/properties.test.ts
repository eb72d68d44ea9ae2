/** Invariant 4 of ARCHITECTURE.md for the welded-detail core: never a throw, NaN or Infinity, whatever the input. */
import fc from 'fast-check';
import { expect, it } from 'vitest';
import type { Computed } from '../../src/computed';
import {
  blocksToLimit,
  constantAmplitudeSafetyFactor,
  enCurve,
  enEffectiveRange,
  enInteraction,
  enSizeFactor,
  equivalentRange,
  hotSpotStress,
  iiwCurve,
  iiwInteraction,
  iiwStressRatioFactor,
  iiwThicknessFactor,
  improvedClass,
  rangeUtilisation,
  stressRangeLimit,
  throatNormalRange,
  weldDamage,
  weldLife,
  weldStrengthAtLife,
} from '../../src/weld';

function finite(c: Computed): void {
  expect(Number.isFinite(c.value)).toBe(true);
  for (const t of c.terms ?? []) expect(Number.isFinite(t.value)).toBe(true);
}

it('every function returns finite values and terms for any doubles', () => {
  fc.assert(
    fc.property(fc.double(), fc.double(), fc.double(), (a, b, c) => {
      finite(enCurve(a));
      finite(iiwCurve(a, '2016'));
      const curve = iiwCurve(Math.abs(a) % 3e8, '2008').curve;
      finite(weldLife(curve, b, 'variable'));
      finite(weldStrengthAtLife(curve, b, 'constant'));
      finite(enSizeFactor(a, true));
      finite(iiwThicknessFactor(a, 'toe-as-welded', { L: b, shortAttachmentRule: true }));
      finite(iiwStressRatioFactor(a, b, 'stress-relieved'));
      finite(enEffectiveRange(a, b, true));
      finite(improvedClass({ standard: 'IIW', FAT: a, method: 'hfmi', material: 'steel', fy: b, R: c }));
      finite(improvedClass({ standard: 'IIW', FAT: a, method: 'hammer-peening', material: 'steel', fy: b }));
      finite(hotSpotStress('a-quadratic', [a, b, c], c));
      finite(throatNormalRange({ deltaFPerp: a, a: b, welds: 2 }));
      finite(weldDamage(curve, [{ range: a, count: b }]));
      finite(equivalentRange(a, curve));
      finite(blocksToLimit(a, b));
      finite(rangeUtilisation(a, b, c, 1));
      finite(enInteraction(a, b));
      finite(iiwInteraction(a, b, false));
      finite(stressRangeLimit('IIW', a, b, 'normal'));
      finite(constantAmplitudeSafetyFactor(curve, a, b));
    }),
  );
});
