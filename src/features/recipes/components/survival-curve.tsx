import { scaleLinear } from 'd3-scale';
import { area, curveStepAfter, line } from 'd3-shape';
import type { SurvivalCurve } from '@shared/shelf-life/types';

const WIDTH = 420;
const HEIGHT = 170;
const MARGIN = { top: 8, right: 12, bottom: 30, left: 40 };

/** The Kaplan–Meier curve as a step line with its 95 % band, censored samples as ticks. */
export function SurvivalCurveChart({ curve, label }: { curve: SurvivalCurve; label: string }) {
  const end = Math.max(curve.lastTimeDays, 1);
  const x = scaleLinear().domain([0, end]).range([MARGIN.left, WIDTH - MARGIN.right]);
  const y = scaleLinear().domain([0, 1]).range([HEIGHT - MARGIN.bottom, MARGIN.top]);
  const points = [{ timeDays: 0, survival: 1, low: 1, high: 1 }, ...curve.steps, { ...(curve.steps.at(-1) ?? { survival: 1, low: 1, high: 1 }), timeDays: end }];
  const path = line<(typeof points)[number]>().x((p) => x(p.timeDays)).y((p) => y(p.survival)).curve(curveStepAfter)(points) ?? '';
  const band = area<(typeof points)[number]>().x((p) => x(p.timeDays)).y0((p) => y(p.low)).y1((p) => y(p.high)).curve(curveStepAfter)(points) ?? '';
  const censored = curve.steps.filter((step) => step.censored > 0);
  return (
    <svg viewBox={`0 0 ${WIDTH} ${HEIGHT}`} className="w-full max-w-md" role="img" aria-label={label} data-testid="survival-curve">
      <path d={band} className="fill-fjord-100" />
      <path d={path} className="fill-none stroke-fjord-700" strokeWidth={2} />
      {censored.map((step) => (
        <line key={step.timeDays} x1={x(step.timeDays)} x2={x(step.timeDays)} y1={y(step.survival) - 5} y2={y(step.survival) + 5} className="stroke-ink" strokeWidth={1.5} />
      ))}
      <line x1={MARGIN.left} x2={WIDTH - MARGIN.right} y1={y(0)} y2={y(0)} className="stroke-line" />
      <line x1={MARGIN.left} x2={MARGIN.left} y1={y(0)} y2={y(1)} className="stroke-line" />
      {x.ticks(5).map((tick) => (
        <text key={tick} x={x(tick)} y={HEIGHT - MARGIN.bottom + 14} textAnchor="middle" className="fill-ink-soft text-[10px]">{tick}</text>
      ))}
      {[0, 0.5, 1].map((tick) => (
        <text key={tick} x={MARGIN.left - 6} y={y(tick) + 3} textAnchor="end" className="fill-ink-soft text-[10px]">{tick}</text>
      ))}
      <text x={(MARGIN.left + WIDTH - MARGIN.right) / 2} y={HEIGHT - 4} textAnchor="middle" className="fill-ink-soft text-[10px]">age (days)</text>
      <text x={10} y={(MARGIN.top + HEIGHT - MARGIN.bottom) / 2} textAnchor="middle" transform={`rotate(-90 10 ${(MARGIN.top + HEIGHT - MARGIN.bottom) / 2})`} className="fill-ink-soft text-[10px]">still standing</text>
    </svg>
  );
}
