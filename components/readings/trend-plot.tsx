import { scaleLinear, scaleTime } from 'd3-scale';
import { line } from 'd3-shape';
import Svg, { Circle, G, Line, Path, Polygon, Rect, Text as SvgText } from 'react-native-svg';
import { chart, type MarkerShape, type SeriesStyle } from '@/components/readings/chart-theme';
import { timeDomain, valueDomain, type ReferenceLine, type TrendPoint, type TrendSeries } from '@/components/readings/trend-series';
import { formatNumber } from '@/shared/calc';

export function Marker({ shape, x, y, r, color }: { shape: MarkerShape; x: number; y: number; r: number; color: string }) {
  switch (shape) {
    case 'square':
      return <Rect x={x - r} y={y - r} width={r * 2} height={r * 2} fill={color} />;
    case 'triangle':
      return <Polygon points={`${x},${y - r * 1.2} ${x + r * 1.1},${y + r * 0.8} ${x - r * 1.1},${y + r * 0.8}`} fill={color} />;
    case 'diamond':
      return <Polygon points={`${x},${y - r * 1.3} ${x + r * 1.1},${y} ${x},${y + r * 1.3} ${x - r * 1.1},${y}`} fill={color} />;
    default:
      return <Circle cx={x} cy={y} r={r} fill={color} />;
  }
}

const DAY_MS = 86_400_000;

function timeLabel(t: Date, spanMs: number): string {
  if (spanMs <= 2 * DAY_MS) return t.toLocaleTimeString('en-GB', { hour: '2-digit', minute: '2-digit' });
  if (spanMs <= 400 * DAY_MS) return t.toLocaleDateString('en-GB', { day: 'numeric', month: 'short' });
  return t.toLocaleDateString('en-GB', { month: 'short', year: 'numeric' });
}

interface Props {
  width: number;
  height: number;
  unit: string;
  series: { series: TrendSeries; style: SeriesStyle }[];
  references: ReferenceLine[];
  accessibilityLabel: string;
}

/** Axes, gridlines, reference lines and one line with markers per series, scaled by d3. */
export function TrendPlot({ width, height, unit, series, references, accessibilityLabel }: Props) {
  const m = chart.margin;
  const innerW = Math.max(10, width - m.left - m.right);
  const innerH = Math.max(10, height - m.top - m.bottom);
  const allPoints = series.flatMap((s) => s.series.points);
  const [t0, t1] = timeDomain(allPoints.map((p) => p.t));
  const x = scaleTime().domain([t0, t1]).range([0, innerW]);
  const y = scaleLinear()
    .domain(valueDomain([...allPoints.map((p) => p.v), ...references.map((r) => r.value)]))
    .range([innerH, 0])
    .nice(chart.yTicks);
  // d3 picks "nice" intervals that can be denser than asked; thin them so dates never overlap.
  const maxXTicks = Math.max(2, Math.floor(innerW / chart.xTickSpacing));
  const niceXTicks = x.ticks(maxXTicks);
  const step = Math.ceil(niceXTicks.length / maxXTicks);
  const xTicks = niceXTicks.filter((_, i) => i % step === 0);
  const yTicks = y.ticks(chart.yTicks);
  const span = t1.getTime() - t0.getTime();
  const path = line<TrendPoint>().x((p) => x(p.t)).y((p) => y(p.v));
  const font = chart.tickFont;
  return (
    <Svg width={width} height={height} accessibilityLabel={accessibilityLabel} role="img">
      <SvgText x={m.left - 8} y={m.top - 16} fontFamily={font.fontFamily} fontSize={font.fontSize} fill={chart.text} textAnchor="end">
        {unit}
      </SvgText>
      <G transform={`translate(${m.left},${m.top})`}>
        {yTicks.map((v) => (
          <G key={`y${v}`}>
            <Line x1={0} x2={innerW} y1={y(v)} y2={y(v)} stroke={chart.grid} strokeWidth={1} />
            <SvgText x={-8} y={y(v) + font.fontSize / 3} fontFamily={font.fontFamily} fontSize={font.fontSize} fill={chart.text} textAnchor="end">
              {formatNumber(v, 3)}
            </SvgText>
          </G>
        ))}
        <Line x1={0} x2={innerW} y1={innerH} y2={innerH} stroke={chart.axis} strokeWidth={1.5} />
        <Line x1={0} x2={0} y1={0} y2={innerH} stroke={chart.axis} strokeWidth={1.5} />
        {xTicks.map((t) => (
          <G key={`x${t.getTime()}`}>
            <Line x1={x(t)} x2={x(t)} y1={innerH} y2={innerH + 5} stroke={chart.axis} strokeWidth={1.5} />
            <SvgText x={x(t)} y={innerH + 8 + font.fontSize} fontFamily={font.fontFamily} fontSize={font.fontSize} fill={chart.text} textAnchor="middle">
              {timeLabel(t, span)}
            </SvgText>
          </G>
        ))}
        {series.map(({ series: s, style }) => (
          <G key={s.key}>
            {s.points.length > 1 ? (
              <Path d={path(s.points) ?? ''} stroke={style.color} strokeWidth={chart.strokeWidth} strokeDasharray={style.dash} fill="none" />
            ) : null}
            {s.points.map((p) => (
              <Marker key={`${p.readingId}`} shape={style.marker} x={x(p.t)} y={y(p.v)} r={chart.markerRadius} color={style.color} />
            ))}
          </G>
        ))}
        {references.map((r) => {
          const color = r.tone === 'danger' ? chart.dangerLine : chart.neutralLine;
          const text = `${r.label} ${formatNumber(r.value, 3)} ${unit}`;
          // A backing plate keeps the label readable where a series crosses it.
          const plateW = text.length * font.fontSize * chart.charWidthEm + 8;
          return (
            <G key={`ref${r.label}`}>
              <Line x1={0} x2={innerW} y1={y(r.value)} y2={y(r.value)} stroke={color} strokeWidth={1.5} strokeDasharray="3 3" />
              <Rect x={4} y={y(r.value) - font.fontSize - 5} width={plateW} height={font.fontSize + 4} fill={chart.plate} opacity={0.85} rx={2} />
              <SvgText x={8} y={y(r.value) - 5} fontFamily={font.fontFamily} fontSize={font.fontSize} fill={color} textAnchor="start">
                {text}
              </SvgText>
            </G>
          );
        })}
      </G>
    </Svg>
  );
}
