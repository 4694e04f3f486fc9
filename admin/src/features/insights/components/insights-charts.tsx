import {
  Box,
  Card,
  Flex,
  Heading,
  HStack,
  Stack,
  Table,
  Text,
  useChakraContext,
  VisuallyHidden,
} from '@chakra-ui/react';
import { minorUnitDigits } from '@nappe/shared';
import type { ReactNode } from 'react';
import {
  Bar,
  BarChart,
  CartesianGrid,
  Line,
  LineChart,
  ReferenceLine,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import type { FoodCostMonth, PlatesWeek, RevenueMonth } from '../api/get-dashboard';
import {
  formatCount,
  formatMinor,
  formatMinorCompact,
  formatMonthLong,
  formatMonthShort,
  formatPercent,
  formatWeekLong,
  formatWeekShort,
  moneyTicks,
} from '../lib/format';
import { foodCostSummary, isAhead, platesSummary, revenueSummary } from '../lib/summaries';

/**
 * The dashboard's three charts (recharts, loaded with the Insights screen only). Each chart is a
 * picture for sighted readers: screen readers get the summary sentence and a table with every
 * figure instead, and no series is told apart by colour alone (a pattern and a label do it).
 */

function useChartColours() {
  const { token } = useChakraContext();
  return {
    ink: token('colors.ink.900') as string,
    muted: token('colors.ink.600') as string,
    grid: token('colors.cream.300') as string,
    pistachio: token('colors.pistachio.600') as string,
    caramel: token('colors.caramel.500') as string,
    caramelDark: token('colors.caramel.800') as string,
    berry: token('colors.berry.600') as string,
    paper: token('colors.cream.50') as string,
  };
}

const AXIS_TICK = { fontSize: 12 };

function ChartCard({
  id,
  title,
  summary,
  legend,
  table,
  children,
}: {
  id: string;
  title: string;
  summary: string;
  legend?: ReactNode;
  table: ReactNode;
  /** The drawing; null when there is nothing to draw (the summary says why). */
  children: ReactNode | null;
}) {
  return (
    <Card.Root
      as="section"
      aria-labelledby={`${id}-title`}
      variant="outline"
      bg="bg.panel"
      borderColor="border"
      minW="0"
    >
      <Card.Body gap="3" p={{ base: '4', md: '6' }}>
        <Heading as="h2" id={`${id}-title`} fontSize="xl" fontWeight="normal">
          {title}
        </Heading>
        <Text color="fg.muted" textStyle="sm" data-testid={`${id}-summary`}>
          {summary}
        </Text>
        {/* The drawing repeats the table below; assistive technology reads the table. */}
        {children && (
          <Box aria-hidden="true" w="full" h="60" minW="0">
            {children}
          </Box>
        )}
        {children && legend}
        {table}
      </Card.Body>
    </Card.Root>
  );
}

function Swatch({ children, label }: { children: ReactNode; label: string }) {
  return (
    <HStack gap="2" textStyle="sm" color="fg.muted">
      <svg width="18" height="12" aria-hidden="true" focusable="false">
        {children}
      </svg>
      <Text as="span">{label}</Text>
    </HStack>
  );
}

function HiddenTable({
  caption,
  columns,
  rows,
}: {
  caption: string;
  columns: string[];
  rows: Array<{ key: string; cells: ReactNode[] }>;
}) {
  return (
    <VisuallyHidden>
      <Table.Root>
        <Table.Caption>{caption}</Table.Caption>
        <Table.Header>
          <Table.Row>
            {columns.map((c) => (
              <Table.ColumnHeader key={c} scope="col">
                {c}
              </Table.ColumnHeader>
            ))}
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {rows.map((row) => (
            <Table.Row key={row.key}>
              {row.cells.map((cell, i) =>
                i === 0 ? (
                  <Table.ColumnHeader key={i} scope="row">
                    {cell}
                  </Table.ColumnHeader>
                ) : (
                  <Table.Cell key={i}>{cell}</Table.Cell>
                ),
              )}
            </Table.Row>
          ))}
        </Table.Body>
      </Table.Root>
    </VisuallyHidden>
  );
}

const tooltipStyle = (paper: string, border: string) => ({
  contentStyle: { background: paper, border: `1px solid ${border}`, borderRadius: 6, fontSize: 13 },
  cursor: { fillOpacity: 0.25 },
});

export function RevenueChart({
  months,
  currency,
}: {
  months: readonly RevenueMonth[];
  currency: string;
}) {
  const c = useChartColours();
  const data = months.map((m) => ({ ...m, label: formatMonthShort(m.month) }));
  const ticks = moneyTicks(
    Math.min(0, ...months.map((m) => m.revenueMinor)),
    Math.max(0, ...months.map((m) => m.revenueMinor)),
    minorUnitDigits(currency),
  );
  return (
    <ChartCard
      id="revenue"
      title="Revenue by month"
      summary={revenueSummary(months, currency)}
      legend={
        <Flex gap="4" wrap="wrap">
          <Swatch label="Received, less refunds, in the month the money settled">
            <rect width="18" height="12" rx="2" fill={c.pistachio} />
          </Swatch>
        </Flex>
      }
      table={
        <HiddenTable
          caption={`Revenue by month, ${currency}`}
          columns={['Month', 'Received', 'Refunded', 'Revenue']}
          rows={months.map((m) => ({
            key: m.month,
            cells: [
              formatMonthLong(m.month),
              formatMinor(m.receivedMinor, currency),
              formatMinor(m.refundedMinor, currency),
              formatMinor(m.revenueMinor, currency),
            ],
          }))}
        />
      }
    >
      <BarChart
        responsive
        style={{ width: '100%', height: '100%' }}
        data={data}
        accessibilityLayer={false}
        margin={{ top: 8, right: 8, bottom: 0, left: 0 }}
      >
        <CartesianGrid vertical={false} stroke={c.grid} />
        <XAxis
          dataKey="label"
          tick={{ ...AXIS_TICK, fill: c.muted }}
          tickLine={false}
          interval={1}
        />
        <YAxis
          width={56}
          ticks={ticks}
          domain={[ticks[0]!, ticks[ticks.length - 1]!]}
          tick={{ ...AXIS_TICK, fill: c.muted }}
          tickFormatter={(v: number) => formatMinorCompact(v, currency)}
        />
        <Tooltip
          {...tooltipStyle(c.paper, c.grid)}
          formatter={(v) => [formatMinor(Number(v), currency), 'Revenue']}
          labelFormatter={(_, payload) =>
            payload?.[0] ? formatMonthLong((payload[0].payload as RevenueMonth).month) : ''
          }
        />
        <ReferenceLine y={0} stroke={c.muted} />
        <Bar dataKey="revenueMinor" name="Revenue" fill={c.pistachio} radius={[3, 3, 0, 0]} />
      </BarChart>
    </ChartCard>
  );
}

export function PlatesChart({ weeks, today }: { weeks: readonly PlatesWeek[]; today: string }) {
  const c = useChartColours();
  const data = weeks.map((w) => ({
    weekStart: w.weekStart,
    label: formatWeekShort(w.weekStart),
    toDate: isAhead(w, today) ? 0 : w.plates,
    ahead: isAhead(w, today) ? w.plates : 0,
  }));
  const thisWeek = [...weeks].reverse().find((w) => !isAhead(w, today));
  return (
    <ChartCard
      id="plates"
      title="Plates by week"
      summary={platesSummary(weeks, today)}
      legend={
        <Flex gap="4" wrap="wrap">
          <Swatch label="Up to this week (solid)">
            <rect width="18" height="12" rx="2" fill={c.pistachio} />
          </Swatch>
          <Swatch label="Booked ahead (striped)">
            <rect
              width="17"
              height="11"
              x="0.5"
              y="0.5"
              rx="2"
              fill="url(#plates-ahead-swatch)"
              stroke={c.caramelDark}
            />
            <defs>
              <pattern
                id="plates-ahead-swatch"
                width="4"
                height="4"
                patternUnits="userSpaceOnUse"
                patternTransform="rotate(45)"
              >
                <rect width="4" height="4" fill={c.paper} />
                <rect width="2" height="4" fill={c.caramel} />
              </pattern>
            </defs>
          </Swatch>
        </Flex>
      }
      table={
        <HiddenTable
          caption="Plates by week (confirmed and completed events; weeks start on Monday)"
          columns={['Week', 'Plates', 'When']}
          rows={weeks.map((w) => ({
            key: w.weekStart,
            cells: [
              formatWeekLong(w.weekStart),
              formatCount(w.plates),
              isAhead(w, today) ? 'Booked ahead' : w === thisWeek ? 'This week' : 'Past',
            ],
          }))}
        />
      }
    >
      <BarChart
        responsive
        style={{ width: '100%', height: '100%' }}
        data={data}
        accessibilityLayer={false}
        margin={{ top: 18, right: 20, bottom: 0, left: 0 }}
      >
        <defs>
          <pattern
            id="plates-ahead"
            width="6"
            height="6"
            patternUnits="userSpaceOnUse"
            patternTransform="rotate(45)"
          >
            <rect width="6" height="6" fill={c.paper} />
            <rect width="3" height="6" fill={c.caramel} />
          </pattern>
        </defs>
        <CartesianGrid vertical={false} stroke={c.grid} />
        <XAxis
          dataKey="label"
          tick={{ ...AXIS_TICK, fill: c.muted }}
          tickLine={false}
          interval={3}
        />
        <YAxis width={40} allowDecimals={false} tick={{ ...AXIS_TICK, fill: c.muted }} />
        <Tooltip
          {...tooltipStyle(c.paper, c.grid)}
          formatter={(v, name) => [formatCount(Number(v)), name]}
          labelFormatter={(_, payload) =>
            payload?.[0]
              ? formatWeekLong((payload[0].payload as { weekStart: string }).weekStart)
              : ''
          }
        />
        {thisWeek && (
          <ReferenceLine
            x={formatWeekShort(thisWeek.weekStart)}
            stroke={c.ink}
            strokeDasharray="4 3"
            label={{ value: 'This week', position: 'top', fill: c.ink, fontSize: 12 }}
          />
        )}
        <Bar dataKey="toDate" name="Plates" stackId="plates" fill={c.pistachio} />
        <Bar
          dataKey="ahead"
          name="Plates booked ahead"
          stackId="plates"
          fill="url(#plates-ahead)"
          stroke={c.caramelDark}
          radius={[3, 3, 0, 0]}
        />
      </BarChart>
    </ChartCard>
  );
}

export function FoodCostChart({
  months,
  basis,
  currency,
}: {
  months: readonly FoodCostMonth[];
  basis: string;
  currency: string;
}) {
  const c = useChartColours();
  const data = months.map((m) => ({ ...m, label: formatMonthShort(m.month) }));
  return (
    <ChartCard
      id="food-cost"
      title="Food cost over time"
      summary={foodCostSummary(months)}
      legend={
        <Stack gap="2">
          <Flex gap="4" wrap="wrap">
            <Swatch label="Food cost, % of the events’ revenue without tax (dots: months with events)">
              <line x1="0" y1="6" x2="18" y2="6" stroke={c.caramelDark} strokeWidth="2" />
              <circle cx="9" cy="6" r="3" fill={c.caramelDark} />
            </Swatch>
          </Flex>
          <Text textStyle="xs" color="fg.muted">
            {basis}
          </Text>
        </Stack>
      }
      table={
        <HiddenTable
          caption={`Food cost by month (${currency}); no figure in a month without served events`}
          columns={['Month', 'Food cost', 'Plate cost', 'Revenue without tax']}
          rows={months.map((m) => ({
            key: m.month,
            cells: [
              formatMonthLong(m.month),
              m.percent === null ? 'No events served' : formatPercent(m.percent),
              formatMinor(m.costMinor, currency),
              formatMinor(m.netRevenueMinor, currency),
            ],
          }))}
        />
      }
    >
      {months.every((m) => m.percent === null) ? null : (
        <LineChart
          responsive
          style={{ width: '100%', height: '100%' }}
          data={data}
          accessibilityLayer={false}
          margin={{ top: 8, right: 12, bottom: 0, left: 0 }}
        >
          <CartesianGrid vertical={false} stroke={c.grid} />
          <XAxis dataKey="label" tick={{ ...AXIS_TICK, fill: c.muted }} tickLine={false} />
          <YAxis
            width={48}
            domain={[0, (max: number) => Math.max(40, Math.ceil(max / 10) * 10)]}
            tick={{ ...AXIS_TICK, fill: c.muted }}
            tickFormatter={(v: number) => `${v} %`}
          />
          <Tooltip
            {...tooltipStyle(c.paper, c.grid)}
            formatter={(v) => [formatPercent(Number(v)), 'Food cost']}
            labelFormatter={(_, payload) =>
              payload?.[0] ? formatMonthLong((payload[0].payload as FoodCostMonth).month) : ''
            }
          />
          <Line
            type="monotone"
            dataKey="percent"
            name="Food cost"
            stroke={c.caramelDark}
            strokeWidth={2}
            dot={{ r: 4, fill: c.caramelDark }}
            connectNulls={false}
          />
        </LineChart>
      )}
    </ChartCard>
  );
}
