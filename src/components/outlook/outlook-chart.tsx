import {
  Bar,
  BarChart,
  CartesianGrid,
  Legend,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import type { OutlookWeek } from '../../../shared/schemas/shop-outlook';
import { useMediaQuery } from '../../lib/use-media-query';
import { formatOutlookHours, weekNumber } from './outlook-format';

// Palette colours (tailwind.config.ts): forecast in the field green, planned in loam.
const FORECAST = '#3d5a45'; // field-600
const PLANNED = '#92633d'; // loam-500

/**
 * Forecast labour against planned labour per week, as bars. The chart is a picture only
 * (aria-hidden): the weeks' list below it says every figure in words.
 */
export function OutlookChart({ weeks }: { weeks: OutlookWeek[] }) {
  const narrow = !useMediaQuery('(min-width: 640px)');
  const rows = weeks.map((w) => ({
    week: weekNumber(w.isoWeek),
    forecast: w.labourHours,
    planned: w.plannedLabourHours,
  }));
  return (
    <div aria-hidden="true" className="h-56 w-full">
      <ResponsiveContainer width="100%" height="100%">
        <BarChart
          data={rows}
          margin={{ top: 8, right: narrow ? 4 : 16, bottom: 0, left: narrow ? -20 : 0 }}
          accessibilityLayer={false}
          barGap={1}
        >
          <CartesianGrid stroke="#e3e8e2" vertical={false} />
          <XAxis
            dataKey="week"
            tickLine={false}
            interval={narrow ? 1 : 0}
            tick={{ fontSize: 12, fill: '#4a5d50' }}
          />
          <YAxis allowDecimals={false} tick={{ fontSize: 12, fill: '#4a5d50' }} width={40} />
          <Tooltip formatter={(value) => formatOutlookHours(Number(value))} />
          <Legend wrapperStyle={{ fontSize: 12 }} />
          <Bar
            dataKey="forecast"
            name="Forecast labour (h)"
            fill={FORECAST}
            isAnimationActive={false}
          />
          <Bar
            dataKey="planned"
            name="Planned labour (h)"
            fill={PLANNED}
            isAnimationActive={false}
          />
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}
