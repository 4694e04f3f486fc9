import { Box, Flex, Heading, List, Separator, Stack, Text } from '@chakra-ui/react';
import { formatRateBp, type Quote } from '@nappe/shared';
import type { ReactNode } from 'react';
import { longDate } from '../../../lib/dates';
import { money } from '../../../lib/format';

function Row({
  label,
  value,
  strong = false,
  hint,
}: {
  label: ReactNode;
  value: string;
  strong?: boolean;
  hint?: ReactNode;
}) {
  return (
    <Flex justify="space-between" align="baseline" gap="4" py="1.5">
      <Box>
        <Text fontWeight={strong ? 'semibold' : 'normal'}>{label}</Text>
        {hint && (
          <Text textStyle="sm" color="fg.muted">
            {hint}
          </Text>
        )}
      </Box>
      <Text
        fontWeight={strong ? 'semibold' : 'normal'}
        textStyle={strong ? 'lg' : 'md'}
        whiteSpace="nowrap"
        fontVariantNumeric="tabular-nums"
      >
        {value}
      </Text>
    </Flex>
  );
}

/**
 * The server's quote, as it came: each line (price per guest × guests), the tax included or
 * added, the total, the deposit and the balance with its due date. Nothing here is computed.
 */
export function QuoteSummary({ quote }: { quote: Quote }) {
  const m = (minor: number) => money(minor, quote.currency);
  const rate = formatRateBp(quote.taxRateBp);
  return (
    <Stack gap="1">
      {quote.lines.map((line) => (
        <Row
          key={line.description}
          label={line.description}
          hint={`${m(line.unitPriceMinor)} × ${line.quantity.toLocaleString('en-GB')} ${line.quantity === 1 ? 'guest' : 'guests'}`}
          value={m(line.amountMinor)}
        />
      ))}
      {quote.taxRateBp === 0 ? (
        <Row label="Tax" value={m(0)} hint="No tax is charged." />
      ) : quote.pricesIncludeTax ? null : (
        <Row label={`Tax added (${rate})`} value={m(quote.taxMinor)} />
      )}
      <Separator my="1" />
      <Row
        label="Total"
        value={m(quote.totalMinor)}
        strong
        hint={
          quote.pricesIncludeTax && quote.taxRateBp > 0
            ? `Includes ${m(quote.taxMinor)} tax (${rate}).`
            : undefined
        }
      />
      <Separator my="1" />
      {quote.paymentPlan === 'deposit_and_balance' ? (
        <>
          <Row
            label={`Deposit, to pay when booking (${quote.pricing.depositPercent} %)`}
            value={m(quote.depositMinor)}
          />
          <Row
            label="Balance"
            hint={quote.balanceDueDate ? `Due by ${longDate(quote.balanceDueDate)}` : undefined}
            value={m(quote.balanceMinor)}
          />
        </>
      ) : (
        <Row
          label="To pay when booking"
          hint="The whole total, in one payment."
          value={m(quote.depositMinor)}
        />
      )}
    </Stack>
  );
}

/** The quote's own sentences (price, tax, what to pay when), as the server wrote them. */
export function QuoteNotes({ quote }: { quote: Quote }) {
  return (
    <List.Root as="ul" ps="5" gap="1" textStyle="sm" color="fg.muted">
      {quote.notes.map((n) => (
        <List.Item key={n}>{n}</List.Item>
      ))}
    </List.Root>
  );
}

/** The cancellation tiers in plain words, earliest cancellation first. */
export function CancellationPolicy({
  lines,
  headingId,
}: {
  lines: readonly string[];
  headingId: string;
}) {
  return (
    <Stack as="section" aria-labelledby={headingId} gap="2">
      <Heading as="h3" id={headingId} fontSize="lg" fontWeight="normal">
        If you cancel
      </Heading>
      <List.Root as="ul" ps="5" gap="1" textStyle="sm">
        {lines.map((line) => (
          <List.Item key={line}>{line}</List.Item>
        ))}
      </List.Root>
      <Text textStyle="sm" color="fg.muted">
        The days are counted to the event date. The refund goes back to the card you paid with.
      </Text>
    </Stack>
  );
}
