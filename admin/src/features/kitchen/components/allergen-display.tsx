import { Badge, Box, HStack, List, Stack, Text, Wrap } from '@chakra-ui/react';
import type {
  AllergenDeclaration,
  AllergenicFood,
  AllergenReport,
  LabelSegment,
} from '@nappe/shared';
import { AllergyIcon, TraceIcon } from '../../../components/ui/icons';
import { foodLabel, formWord } from '../lib/allergen-text';

/** One allergen in words, with our icon: a triangle for "contains", a dotted ring for "may contain". */
export function AllergenBadge({
  label,
  relation,
}: {
  label: string;
  relation: 'contains' | 'may_contain';
}) {
  return (
    <Badge
      variant="subtle"
      colorPalette={relation === 'contains' ? 'danger' : 'caramel'}
      size="md"
      gap="1"
      whiteSpace="normal"
      textAlign="start"
    >
      {relation === 'contains' ? (
        <AllergyIcon boxSize="3.5" aria-hidden />
      ) : (
        <TraceIcon boxSize="3.5" aria-hidden />
      )}
      {label}
    </Badge>
  );
}

/** The label text with allergens in bold: built from the shared segments, never from HTML. */
export function LabelText({ segments }: { segments: readonly LabelSegment[] }) {
  return (
    <Text textStyle="sm" lineHeight="tall">
      {segments.map((segment, i) =>
        segment.emphasis ? (
          <strong key={i}>{segment.text}</strong>
        ) : (
          <span key={i}>{segment.text}</span>
        ),
      )}
    </Text>
  );
}

function declaredLabel(entry: { label: string; foods: readonly AllergenicFood[] }) {
  if (entry.foods.length === 0) return entry.label;
  const foods = entry.foods.map(foodLabel);
  // "Eggs", not "Eggs (egg)"; but "Soybeans (soya)" and "Nuts (almonds)" say more.
  return foods.length === 1 && entry.label.toLowerCase().startsWith(foods[0]!.toLowerCase())
    ? entry.label
    : `${entry.label} (${foods.join(', ')})`;
}

function Declaration<G extends string>({
  title,
  declaration,
}: {
  title: string;
  declaration: AllergenDeclaration<G>;
}) {
  const none = declaration.contains.length === 0 && declaration.mayContain.length === 0;
  return (
    <Stack gap="2">
      <Text fontWeight="semibold" textStyle="sm">
        {title}
      </Text>
      {none ? (
        <Text textStyle="sm" color="fg.muted">
          Nothing to declare.
        </Text>
      ) : (
        <>
          {declaration.contains.length > 0 && (
            <Box>
              <Text textStyle="xs" color="fg.muted" mb="1">
                Contains
              </Text>
              <Wrap gap="1.5">
                {declaration.contains.map((d) => (
                  <AllergenBadge key={d.group} label={declaredLabel(d)} relation="contains" />
                ))}
              </Wrap>
            </Box>
          )}
          {declaration.mayContain.length > 0 && (
            <Box>
              <Text textStyle="xs" color="fg.muted" mb="1">
                May contain
              </Text>
              <Wrap gap="1.5">
                {declaration.mayContain.map((d) => (
                  <AllergenBadge key={d.group} label={declaredLabel(d)} relation="may_contain" />
                ))}
              </Wrap>
            </Box>
          )}
        </>
      )}
      {declaration.exempt.length > 0 && (
        <List.Root ps="4" textStyle="xs" color="fg.muted" gap="1">
          {declaration.exempt.map((e, i) => (
            <List.Item key={`${e.food}-${e.carrier.ingredientId}-${i}`}>
              Not declared: {foodLabel(e.food)}
              {e.form ? ` as ${formWord(e.form)}` : ''} in {e.carrier.ingredientName} — {e.summary}{' '}
              ({e.citation}).
            </List.Item>
          ))}
        </List.Root>
      )}
    </Stack>
  );
}

/** Contains kept apart from may contain, EU 14 groups beside the US 9, with dietary flags. */
export function AllergenReportView({
  report,
  usStatement,
}: {
  report: Pick<AllergenReport, 'eu' | 'us' | 'advisories' | 'dietary' | 'sulphites'>;
  usStatement?: string | null;
}) {
  const d = report.dietary;
  const flags = [
    d.vegan ? 'Vegan' : d.vegetarian ? 'Vegetarian, not vegan' : 'Not vegetarian',
    d.gelatin.length > 0 ? `Gelatin (${d.gelatin.join(', ')})` : 'No gelatin',
    d.alcohol ? 'Contains alcohol' : 'No alcohol',
  ];
  return (
    <Stack gap="4">
      <Declaration title="EU (Regulation 1169/2011, 14 groups)" declaration={report.eu} />
      <Declaration title="US (FD&C Act, 9 major allergens)" declaration={report.us} />
      {usStatement && (
        <Text textStyle="sm">
          <Text as="span" color="fg.muted">
            US label:{' '}
          </Text>
          {usStatement}
        </Text>
      )}
      {report.sulphites && (
        <Text textStyle="xs" color="fg.muted">
          Sulphites:{' '}
          {report.sulphites.so2MgPerKg === null
            ? 'no SO₂ figure for every source, so declared.'
            : `${report.sulphites.so2MgPerKg} mg/kg SO₂ as consumed — ${
                report.sulphites.declaredInEu ? 'declared' : 'under the 10 mg/kg threshold'
              } in the EU.`}
        </Text>
      )}
      {report.advisories.map((a) => (
        <Text key={a.kind} textStyle="xs" color="fg.muted">
          {a.text}
        </Text>
      ))}
      <Box>
        <Text fontWeight="semibold" textStyle="sm" mb="1">
          Diet
        </Text>
        <HStack gap="1.5" wrap="wrap">
          {flags.map((flag) => (
            <Badge key={flag} variant="outline" size="md">
              {flag}
            </Badge>
          ))}
        </HStack>
      </Box>
    </Stack>
  );
}
