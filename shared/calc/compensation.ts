// Weather compensation: a flow setpoint that falls as the outside warms, as a straight line
// between two points of the system's heating curve, held flat beyond them.
import { formatNumber as f, isReading } from '@/shared/calc/check-result';

export interface CompensationCurve {
  /** Outside temperature at the cold end of the curve (the design outside temperature). */
  outsideLowC: number;
  flowAtLowC: number;
  /** Outside temperature at the mild end of the curve. */
  outsideHighC: number;
  flowAtHighC: number;
}

export interface CompensationSettings {
  compensationOutsideLowC?: number | null;
  compensationFlowAtLowC?: number | null;
  compensationOutsideHighC?: number | null;
  compensationFlowAtHighC?: number | null;
}

/** The curve when all four points are set and the outside temperatures differ; otherwise null. */
export function compensationCurve(s: CompensationSettings): CompensationCurve | null {
  const { compensationOutsideLowC: ol, compensationFlowAtLowC: fl, compensationOutsideHighC: oh, compensationFlowAtHighC: fh } = s;
  if (!isReading(ol) || !isReading(fl) || !isReading(oh) || !isReading(fh) || oh <= ol) return null;
  return { outsideLowC: ol, flowAtLowC: fl, outsideHighC: oh, flowAtHighC: fh };
}

/** The compensated flow setpoint at an outside temperature: linear between the two points, flat beyond them. */
export function compensatedSetpointC(curve: CompensationCurve, outsideC: number): number {
  const clamped = Math.min(curve.outsideHighC, Math.max(curve.outsideLowC, outsideC));
  const slope = (curve.flowAtHighC - curve.flowAtLowC) / (curve.outsideHighC - curve.outsideLowC);
  return curve.flowAtLowC + slope * (clamped - curve.outsideLowC);
}

/** The curve in words, for the source of a setpoint. */
export function describeCurve(curve: CompensationCurve, outsideC: number): string {
  return `Weather compensation: ${f(curve.flowAtLowC)} °C flow at ${f(curve.outsideLowC)} °C outside, ` +
    `${f(curve.flowAtHighC)} °C at ${f(curve.outsideHighC)} °C, read at ${f(outsideC)} °C outside`;
}
