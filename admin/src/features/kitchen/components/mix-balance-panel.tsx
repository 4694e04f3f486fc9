import { Box, Flex, Heading, List, Stack, Text } from '@chakra-ui/react';
import type { BandCheck, MixBalance } from '@nappe/shared';
import { formatNumber } from '../lib/labels';

const CLASS_LABELS = {
  ice_cream: 'Ice cream',
  frozen_custard: 'Frozen custard',
  neither: 'Neither ice cream nor frozen custard',
} as const;

const STATUS_WORDS = { below: 'below', within: 'within', above: 'above' } as const;

/**
 * One measure against its target band: a bar with the band shaded and a mark at the value,
 * and the same in words for anyone who cannot see the bar.
 */
function BandBar({ check }: { check: BandCheck }) {
  // The scale runs from 0 to half as much again as the top of the band (or the value, if higher).
  const scaleMax = Math.max(check.max * 1.5, check.value * 1.1, 1);
  const pct = (v: number) => `${Math.min(100, Math.max(0, (v / scaleMax) * 100))}%`;
  const words = `${check.label} ${formatNumber(check.value, 1)} %, ${STATUS_WORDS[check.status]} the ${check.min}–${check.max} % band`;
  const off = check.status !== 'within';
  return (
    <Box>
      <Flex justify="space-between" gap="2" textStyle="sm">
        <Text fontWeight="medium">{check.label}</Text>
        <Text
          fontVariantNumeric="tabular-nums"
          color={off ? 'fg.warning' : 'fg'}
          fontWeight={off ? 'semibold' : 'normal'}
        >
          {formatNumber(check.value, 1)} %{' '}
          <Text as="span" color="fg.muted" fontWeight="normal">
            ({check.status === 'within' ? 'in band' : `${STATUS_WORDS[check.status]} band`}{' '}
            {check.min}–{check.max})
          </Text>
        </Text>
      </Flex>
      <Box
        role="meter"
        aria-label={check.label}
        aria-valuemin={0}
        aria-valuemax={Math.round(scaleMax)}
        aria-valuenow={check.value}
        aria-valuetext={words}
        position="relative"
        h="2.5"
        mt="1"
        borderRadius="full"
        bg="bg.emphasized"
        overflow="hidden"
      >
        <Box
          position="absolute"
          top="0"
          bottom="0"
          left={pct(check.min)}
          width={`calc(${pct(check.max)} - ${pct(check.min)})`}
          bg="accent.muted"
        />
        <Box
          position="absolute"
          top="0"
          bottom="0"
          left={`calc(${pct(check.value)} - 2px)`}
          w="4px"
          borderRadius="full"
          bg={off ? 'caramel.solid' : 'fg'}
        />
      </Box>
    </Box>
  );
}

/** Fat, milk solids, sugars, solids, sweetness and freezing point of a frozen mix, and its US class. */
export function MixBalancePanel({ mix }: { mix: MixBalance }) {
  const c = mix.composition;
  const cls = mix.classification;
  return (
    <Stack gap="4">
      <Text textStyle="sm" color="fg.muted">
        Per 100 g of mix ({formatNumber(c.massG, 1)} g): fat {formatNumber(c.fat, 1)} %, milk solids
        non-fat {formatNumber(c.msnf, 1)} %, sugars {formatNumber(c.sugars, 1)} %, total solids{' '}
        {formatNumber(c.totalSolids, 1)} %, POD {formatNumber(c.pod, 1)}, PAC{' '}
        {formatNumber(c.pac, 1)}.
      </Text>
      <Stack gap="3">
        {mix.bands.map((check) => (
          <BandBar key={check.measure} check={check} />
        ))}
      </Stack>
      <Text textStyle="sm">{mix.styleReason}</Text>
      <Text textStyle="xs" color="fg.muted">
        {mix.style === 'sorbet'
          ? 'Sorbet bands (sugars, solids, water, POD, PAC) are common practice for serving at about −12 °C.'
          : 'Bands: milkfat, milk solids, sugars and solids from Goff’s ice-cream formulation ranges; POD and PAC common practice for serving at about −12 °C.'}{' '}
        POD and PAC are grams of sucrose equivalent per 100 g of mix.
      </Text>
      {mix.warnings.length > 0 && (
        <List.Root ps="4" gap="1" textStyle="sm">
          {mix.warnings.map((w) => (
            <List.Item key={w}>{w}</List.Item>
          ))}
        </List.Root>
      )}
      <Box borderWidth="1px" borderColor="border" borderRadius="l2" p="3" bg="bg.subtle">
        <Heading as="h4" size="sm" mb="1">
          21 CFR 135.110: {CLASS_LABELS[cls.class]}
        </Heading>
        <List.Root ps="4" gap="1" textStyle="sm">
          {cls.reasons.map((r) => (
            <List.Item key={r}>{r}</List.Item>
          ))}
        </List.Root>
        <Text textStyle="xs" color="fg.muted" mt="2">
          {cls.assumptions.join(' ')} Highest overrun meeting the per-gallon limits:{' '}
          {formatNumber(cls.maxOverrunPercent, 1)} %.
        </Text>
      </Box>
    </Stack>
  );
}
