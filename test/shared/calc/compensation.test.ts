import { describe, expect, it } from 'vitest';

import { compensatedSetpointC, compensationCurve } from '@/shared/calc/compensation';

// An invented heating curve: 80 °C flow at −3 °C outside, 40 °C flow at 18 °C outside.
const curve = compensationCurve({ compensationOutsideLowC: -3, compensationFlowAtLowC: 80, compensationOutsideHighC: 18, compensationFlowAtHighC: 40 })!;

describe('weather compensation', () => {
  it('follows a straight line between the two points', () => {
    // 80 + (40 − 80)/(18 − (−3)) · (12 − (−3)) = 80 − 1.9048 · 15 = 51.43 °C (worked by hand)
    expect(compensatedSetpointC(curve, 12)).toBeCloseTo(51.43, 2);
    expect(compensatedSetpointC(curve, -3)).toBe(80);
    expect(compensatedSetpointC(curve, 18)).toBe(40);
  });

  it('holds flat beyond the curve’s ends', () => {
    expect(compensatedSetpointC(curve, -10)).toBe(80);
    expect(compensatedSetpointC(curve, 25)).toBe(40);
  });

  it('needs all four points and a mild end warmer than the cold end', () => {
    expect(compensationCurve({ compensationOutsideLowC: -3, compensationFlowAtLowC: 80 })).toBeNull();
    expect(compensationCurve({ compensationOutsideLowC: 10, compensationFlowAtLowC: 80, compensationOutsideHighC: 5, compensationFlowAtHighC: 40 })).toBeNull();
  });
});
