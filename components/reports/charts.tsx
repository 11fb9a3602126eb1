'use client';

/**
 * The reports' charts (recharts, loaded only by the reports page). Each draws figures the page also lists in a table
 * beside it, so nothing here is the only place a number is shown.
 */
import { Bar, BarChart, CartesianGrid, Legend, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';

const INK = { graphite: '#4a4a50', faint: '#a9a7ab', oak: '#a86a2c', sage: '#4f7a5a', brick: '#a8432f', amber: '#b5832a', edge: '#e3dccd' };
const pct = (v: unknown) => (typeof v === 'number' && Number.isFinite(v) ? `${v.toFixed(1)} %` : '—');
const axis = { stroke: INK.faint, tick: { fill: INK.graphite, fontSize: 12 } };

export interface YieldPoint {
  label: string;
  yield: number | null;
  sawWaste: number | null;
  spoiled: number | null;
}

/** Yield, the saw's waste and spoiled parts as percentages of the stock area per period, with the shop's target. */
export function YieldChart({ points, target }: { points: YieldPoint[]; target: number }) {
  return (
    <div
      className="h-72 w-full"
      role="img"
      aria-label={`Yield over time: ${points.map((p) => `${p.label} ${pct(p.yield)}`).join(', ')}; target ${target} %`}
    >
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={points} margin={{ top: 12, right: 16, bottom: 4, left: 0 }}>
          <CartesianGrid stroke={INK.edge} vertical={false} />
          <XAxis dataKey="label" {...axis} />
          <YAxis domain={[0, 100]} unit=" %" width={52} {...axis} />
          <Tooltip formatter={(v) => pct(v)} />
          <Legend wrapperStyle={{ fontSize: 12 }} />
          <ReferenceLine
            y={target}
            stroke={INK.oak}
            strokeDasharray="6 4"
            label={{ value: `Target ${target} %`, position: 'insideTopRight', fill: INK.oak, fontSize: 12 }}
          />
          <Line
            type="monotone"
            dataKey="yield"
            name="Yield"
            stroke={INK.sage}
            strokeWidth={2.5}
            dot={{ r: 3 }}
            connectNulls
            isAnimationActive={false}
          />
          <Line
            type="monotone"
            dataKey="sawWaste"
            name="Saw waste"
            stroke={INK.graphite}
            strokeWidth={1.5}
            dot={{ r: 2 }}
            connectNulls
            isAnimationActive={false}
          />
          <Line
            type="monotone"
            dataKey="spoiled"
            name="Spoiled at the saw"
            stroke={INK.brick}
            strokeWidth={1.5}
            dot={{ r: 2 }}
            connectNulls
            isAnimationActive={false}
          />
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}

export interface OffcutPoint {
  label: string;
  fromRack: number;
  fromNew: number;
}

/** Stock area cut per period, from the rack's offcuts and from new sheets and boards, stacked. */
export function OffcutUseChart({ points, unit }: { points: OffcutPoint[]; unit: string }) {
  const area = (v: unknown) => (typeof v === 'number' && Number.isFinite(v) ? `${v.toFixed(1)} ${unit}` : '—');
  return (
    <div
      className="h-64 w-full"
      role="img"
      aria-label={`Stock cut per period: ${points.map((p) => `${p.label} ${area(p.fromRack)} from offcuts, ${area(p.fromNew)} new`).join('; ')}`}
    >
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={points} margin={{ top: 12, right: 16, bottom: 4, left: 0 }}>
          <CartesianGrid stroke={INK.edge} vertical={false} />
          <XAxis dataKey="label" {...axis} />
          <YAxis unit={` ${unit}`} width={72} {...axis} />
          <Tooltip formatter={(v) => area(v)} />
          <Legend wrapperStyle={{ fontSize: 12 }} />
          <Bar dataKey="fromRack" name="From offcuts" stackId="cut" fill={INK.sage} isAnimationActive={false} />
          <Bar dataKey="fromNew" name="From new stock" stackId="cut" fill={INK.amber} isAnimationActive={false} />
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}

export interface ValuePoint {
  label: string;
  onHand: number;
  reserved: number;
}

/** Stock value on hand and reserved at each period's close, in the shop's currency. */
export function StockValueChart({ points, currency }: { points: ValuePoint[]; currency: string }) {
  const money = (v: unknown) =>
    typeof v === 'number' && Number.isFinite(v)
      ? new Intl.NumberFormat('en-US', { style: 'currency', currency, maximumFractionDigits: 0 }).format(v)
      : '—';
  return (
    <div
      className="h-64 w-full"
      role="img"
      aria-label={`Stock value at each period’s close: ${points.map((p) => `${p.label} ${money(p.onHand)} on hand, ${money(p.reserved)} reserved`).join('; ')}`}
    >
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={points} margin={{ top: 12, right: 16, bottom: 4, left: 8 }}>
          <CartesianGrid stroke={INK.edge} vertical={false} />
          <XAxis dataKey="label" {...axis} />
          <YAxis tickFormatter={(v) => money(v)} width={76} {...axis} />
          <Tooltip formatter={(v) => money(v)} />
          <Legend wrapperStyle={{ fontSize: 12 }} />
          <Line type="stepAfter" dataKey="onHand" name="On hand" stroke={INK.oak} strokeWidth={2.5} dot={{ r: 3 }} isAnimationActive={false} />
          <Line
            type="stepAfter"
            dataKey="reserved"
            name="Reserved for released plans"
            stroke={INK.graphite}
            strokeWidth={1.5}
            dot={{ r: 2 }}
            isAnimationActive={false}
          />
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}

export interface QuotingPoint {
  label: string;
  sent: number;
  accepted: number;
  declined: number;
  expired: number;
}

/** Quote revisions sent, and what their customers did with them, per period. */
export function QuotingChart({ points }: { points: QuotingPoint[] }) {
  return (
    <div
      className="h-64 w-full"
      role="img"
      aria-label={`Quotes per period: ${points.map((p) => `${p.label} ${p.sent} sent, ${p.accepted} accepted, ${p.declined} declined, ${p.expired} expired`).join('; ')}`}
    >
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={points} margin={{ top: 12, right: 16, bottom: 4, left: 0 }}>
          <CartesianGrid stroke={INK.edge} vertical={false} />
          <XAxis dataKey="label" {...axis} />
          <YAxis allowDecimals={false} width={40} {...axis} />
          <Tooltip />
          <Legend wrapperStyle={{ fontSize: 12 }} />
          <Bar dataKey="sent" name="Sent" fill={INK.graphite} isAnimationActive={false} />
          <Bar dataKey="accepted" name="Accepted" fill={INK.sage} isAnimationActive={false} />
          <Bar dataKey="declined" name="Declined" fill={INK.brick} isAnimationActive={false} />
          <Bar dataKey="expired" name="Expired" fill={INK.faint} isAnimationActive={false} />
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}
