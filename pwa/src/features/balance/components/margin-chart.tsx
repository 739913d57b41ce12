import { Bar, BarChart, Cell, LabelList, ReferenceLine, ResponsiveContainer, XAxis, YAxis } from 'recharts';
import { formatPoints } from '../../../lib/format';
import type { BalanceMargin } from '../api/get-balance';

interface Row {
  category: string;
  /** Sample share minus target share, in percentage points. */
  gap: number;
}

interface GapLabelProps {
  x?: number | string;
  y?: number | string;
  width?: number | string;
  height?: number | string;
  value?: number | string | boolean | null;
}

/** The gap written just beyond the end of its bar, on whichever side that is. */
function GapLabel({ x = 0, y = 0, width = 0, height = 0, value = 0 }: GapLabelProps) {
  const [left, w, top, h, gap] = [Number(x), Number(width), Number(y), Number(height), Number(value)];
  const end = gap >= 0 ? Math.max(left, left + w) + 6 : Math.min(left, left + w) - 6;
  return (
    <text x={end} y={top + h / 2} dy="0.35em" textAnchor={gap >= 0 ? 'start' : 'end'} className="pl-chart-label">
      {formatPoints(gap / 100)}
    </text>
  );
}

/**
 * One quota variable: a bar per category from the target line (0) to the sample's share,
 * right when the sample has more of the category than the population, left when fewer.
 * All variables share one scale (reach, in points) so their gaps compare at a glance.
 */
export function MarginChart({ variable, margins, reach }: { variable: string; margins: BalanceMargin[]; reach: number }) {
  const rows: Row[] = margins.map((m) => ({ category: m.category, gap: (m.unweighted - m.target) * 100 }));
  return (
    <figure className="pl-chart" aria-label={`${variable}: sample against target`}>
      <ResponsiveContainer width="100%" height={rows.length * 34 + 36}>
        <BarChart data={rows} layout="vertical" margin={{ top: 4, right: 8, bottom: 4, left: 4 }} barCategoryGap={6}>
          <XAxis
            type="number"
            domain={[-reach, reach]}
            tickFormatter={(v: number) => (v === 0 ? 'target' : `${v > 0 ? '+' : '−'}${Math.abs(v)}`)}
            tick={{ fontSize: 11, fill: 'var(--pl-ink-soft)' }}
            ticks={[-reach, 0, reach]}
            axisLine={false}
            tickLine={false}
          />
          <YAxis type="category" dataKey="category" width={84} tick={{ fontSize: 12, fill: 'var(--pl-ink)' }} axisLine={false} tickLine={false} />
          <ReferenceLine x={0} stroke="var(--pl-ink)" strokeWidth={2} />
          <Bar dataKey="gap" isAnimationActive={false} radius={3}>
            {rows.map((row) => (
              <Cell key={row.category} fill={row.gap >= 0 ? 'var(--pl-teal)' : 'var(--pl-brass)'} />
            ))}
            <LabelList dataKey="gap" content={GapLabel} />
          </Bar>
        </BarChart>
      </ResponsiveContainer>
    </figure>
  );
}
