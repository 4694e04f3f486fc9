import { Badge, Box, Button, Heading, HStack, List, Stack, Text } from '@chakra-ui/react';
import { plural } from '@nappe/shared';
import { useId, useRef, useState } from 'react';
import { AllergyIcon, TraceIcon } from '../../../components/ui/icons';
import type { GuestNote, GuestPlateNote } from '../api/types';
import { finalConflicts, plateState, type PlateState } from '../lib/allergen-words';
import { formatInstant } from '../lib/event-window';
import { AdvisoryRows, ConflictRows } from './conflict-rows';
import { ClearIcon, SwapIcon } from './icons';
import { RemoveSubstitutionButton } from './remove-substitution';
import { RequirementBadges } from './requirement-badges';
import { SubstitutionForm } from './substitution-form';

const STATE_BADGE: Record<
  PlateState,
  { label: string; palette: string; variant: 'solid' | 'subtle'; icon: 'clear' | 'alert' | 'swap' }
> = {
  clear: { label: 'Nothing conflicts', palette: 'accent', variant: 'subtle', icon: 'clear' },
  conflict: { label: 'Conflicts — to resolve', palette: 'danger', variant: 'solid', icon: 'alert' },
  resolved: { label: 'Changed — cleared', palette: 'accent', variant: 'subtle', icon: 'swap' },
  still_conflicts: {
    label: 'Changed — still conflicts',
    palette: 'danger',
    variant: 'solid',
    icon: 'alert',
  },
};

function StateBadge({ state }: { state: PlateState }) {
  const s = STATE_BADGE[state];
  return (
    <Badge colorPalette={s.palette} variant={s.variant} size="lg" gap="1" flexShrink="0">
      {s.icon === 'clear' ? (
        <ClearIcon boxSize="3.5" aria-hidden />
      ) : s.icon === 'swap' ? (
        <SwapIcon boxSize="3.5" aria-hidden />
      ) : (
        <AllergyIcon boxSize="3.5" aria-hidden />
      )}
      {s.label}
    </Badge>
  );
}

/** What the re-check found, in one sentence for the live region. */
export function recheckMessage(guest: GuestNote, dessertId: string, removed = false): string {
  const plate = guest.plates.find((p) => p.dessertId === dessertId);
  if (!plate) return 'Saved.';
  if (removed) {
    return plate.clear
      ? `Change removed: ${guest.label} gets the standard ${plate.dessertName}, which has nothing that conflicts.`
      : `Change removed: ${guest.label}’s ${plate.dessertName} conflicts again.`;
  }
  if (plate.resolved) {
    return `Checked again: nothing on ${guest.label}’s changed ${plate.dessertName} conflicts now.`;
  }
  const left = finalConflicts(plate)
    .flatMap((c) => c.components.map((x) => x.recipeName))
    .filter((name, i, all) => all.indexOf(name) === i);
  return `Checked again: ${guest.label}’s ${plate.dessertName} still conflicts${
    left.length > 0 ? ` (${left.join(', ')})` : ''
  }.`;
}

/** One guest's plate of one dessert: what conflicts, with which component, and what changes. */
export function PlateCheck({
  orderId,
  guest,
  plate,
  canEdit,
  timeZone,
}: {
  orderId: string;
  guest: GuestNote;
  plate: GuestPlateNote;
  canEdit: boolean;
  timeZone: string;
}) {
  const headingId = useId();
  const [editing, setEditing] = useState(false);
  const [announcement, setAnnouncement] = useState('');
  // After a save or a removal the form or the button that was used is gone: the result takes
  // the focus, so a keyboard or screen-reader user lands on what the re-check found.
  const statusRef = useRef<HTMLParagraphElement>(null);
  const focusStatus = () => window.setTimeout(() => statusRef.current?.focus(), 0);
  const state = plateState(plate);
  const sub = plate.substitution;
  const changesPlate = !!sub && sub.changes.length > 0;
  const advisories = (plate.afterSubstitution ?? plate).advisories;

  return (
    <Box as="section" aria-labelledby={headingId} borderTopWidth="1px" borderColor="border" pt="4">
      <Stack gap="3">
        <HStack justify="space-between" align="start" gap="3" wrap="wrap">
          <Heading as="h3" id={headingId} textStyle="lg" fontWeight="normal">
            {plate.dessertName}
          </Heading>
          <StateBadge state={state} />
        </HStack>

        {plate.conflicts.length > 0 ? (
          <Stack gap="2">
            <Text textStyle="sm" fontWeight="semibold" color="danger.fg">
              On the standard plate
            </Text>
            <ConflictRows
              conflicts={plate.conflicts}
              label={`Conflicts of ${plate.dessertName} for ${guest.label}`}
            />
          </Stack>
        ) : (
          <Text color="fg.muted">
            Nothing on the standard plate conflicts with {guest.label}’s requirements.
          </Text>
        )}

        {sub && (
          <Box bg="bg.subtle" borderRadius="l2" borderWidth="1px" borderColor="border" p="3">
            <Stack gap="2">
              <HStack gap="2">
                <SwapIcon boxSize="4" aria-hidden />
                <Text fontWeight="semibold">The chef’s change</Text>
                <Text textStyle="xs" color="fg.muted">
                  recorded {formatInstant(sub.recordedAt, timeZone)}
                </Text>
              </HStack>
              {sub.described.length > 0 && (
                <List.Root ps="5" gap="1" aria-label="What changes on the plate">
                  {sub.described.map((line) => (
                    <List.Item key={line}>{line}</List.Item>
                  ))}
                </List.Root>
              )}
              {sub.note && (
                <Text whiteSpace="pre-wrap" overflowWrap="anywhere">
                  <Text as="span" color="fg.muted">
                    Note, as written:{' '}
                  </Text>
                  <span>{sub.note}</span>
                </Text>
              )}
              {!changesPlate && !plate.clear ? (
                <Text color="danger.fg" fontWeight="medium">
                  A note alone does not change the plate: the conflicts above still stand.
                </Text>
              ) : plate.resolved ? (
                <HStack gap="2" color="fg.success" align="start">
                  <ClearIcon boxSize="4.5" mt="0.5" aria-hidden />
                  <Text fontWeight="medium">
                    Checked again: nothing on the changed plate conflicts.
                  </Text>
                </HStack>
              ) : (
                <Stack gap="2">
                  <HStack gap="2" color="danger.fg" align="start">
                    <AllergyIcon boxSize="4.5" mt="0.5" aria-hidden />
                    <Text fontWeight="medium">
                      Checked again: the changed plate still conflicts.
                    </Text>
                  </HStack>
                  <ConflictRows
                    conflicts={finalConflicts(plate)}
                    label={`Still conflicting on ${guest.label}’s changed ${plate.dessertName}`}
                  />
                </Stack>
              )}
            </Stack>
          </Box>
        )}

        <AdvisoryRows advisories={advisories} />

        <Text
          ref={statusRef}
          tabIndex={-1}
          role="status"
          aria-live="polite"
          fontWeight="medium"
          textStyle="sm"
          outline="none"
        >
          {announcement}
        </Text>

        {canEdit &&
          (editing ? (
            <SubstitutionForm
              orderId={orderId}
              guest={guest}
              plate={plate}
              onCancel={() => setEditing(false)}
              onSaved={(saved) => {
                setEditing(false);
                setAnnouncement(recheckMessage(saved, plate.dessertId));
                focusStatus();
              }}
            />
          ) : (
            <HStack gap="2" wrap="wrap">
              <Button
                size="sm"
                variant={state === 'conflict' || state === 'still_conflicts' ? 'solid' : 'outline'}
                onClick={() => {
                  setAnnouncement('');
                  setEditing(true);
                }}
                aria-label={`${sub ? 'Edit the change' : 'Record a change'}: ${guest.label}, ${plate.dessertName}`}
              >
                <SwapIcon /> {sub ? 'Edit the change' : 'Record a change'}
              </Button>
              {sub && (
                <RemoveSubstitutionButton
                  orderId={orderId}
                  guest={guest}
                  plate={plate}
                  finalFocus={() => statusRef.current}
                  onRemoved={(saved) => {
                    setAnnouncement(recheckMessage(saved, plate.dessertId, true));
                    focusStatus();
                  }}
                />
              )}
            </HStack>
          ))}
      </Stack>
    </Box>
  );
}

/** A plate worth showing: it conflicts, carries an advisory, or the chef changed it. */
function needsAttention(plate: GuestPlateNote): boolean {
  return !plate.clear || plate.advisories.length > 0 || plate.substitution !== null;
}

/** One guest: who, at which table, what they stated, and every dessert of the menu checked. */
export function GuestCard({
  orderId,
  guest,
  canEdit,
  timeZone,
}: {
  orderId: string;
  guest: GuestNote;
  canEdit: boolean;
  timeZone: string;
}) {
  const headingId = useId();
  const shown = guest.plates.filter(needsAttention);
  const standard = guest.plates.filter((p) => !needsAttention(p));
  const open = guest.plates.filter((p) => !p.resolved).length;
  return (
    <Box
      as="article"
      aria-labelledby={headingId}
      borderWidth="1px"
      borderColor={open > 0 ? 'danger.border' : 'border'}
      borderRadius="l3"
      bg="bg.panel"
      px={{ base: '4', md: '6' }}
      py={{ base: '4', md: '5' }}
    >
      <Stack gap="4">
        <Stack gap="2">
          <HStack justify="space-between" align="start" gap="3" wrap="wrap">
            <Stack gap="0.5" minW="0">
              <Heading as="h2" id={headingId} textStyle="2xl" overflowWrap="anywhere">
                {guest.label}
              </Heading>
              <Text color="fg.muted">
                {guest.table ? `Table ${guest.table}` : 'No table given'}
              </Text>
            </Stack>
            {open > 0 ? (
              <Badge colorPalette="danger" variant="subtle" size="lg" gap="1">
                <AllergyIcon boxSize="3.5" aria-hidden />
                {plural(open, 'plate')} to resolve
              </Badge>
            ) : (
              <Badge colorPalette="accent" variant="subtle" size="lg" gap="1">
                <ClearIcon boxSize="3.5" aria-hidden />
                Every plate fits
              </Badge>
            )}
          </HStack>
          <RequirementBadges allergens={guest.allergens} diets={guest.diets} />
          {guest.notes && (
            <Box borderStartWidth="3px" borderColor="caramel.border" ps="3">
              <Text textStyle="xs" color="fg.muted">
                The client’s note, as entered (not medical advice)
              </Text>
              <Text whiteSpace="pre-wrap" overflowWrap="anywhere">
                {guest.notes}
              </Text>
            </Box>
          )}
        </Stack>

        {shown.map((plate) => (
          <PlateCheck
            key={plate.dessertId}
            orderId={orderId}
            guest={guest}
            plate={plate}
            canEdit={canEdit}
            timeZone={timeZone}
          />
        ))}

        {standard.length > 0 && (
          <HStack
            gap="2"
            color="fg.muted"
            align="start"
            borderTopWidth="1px"
            borderColor="border"
            pt="3"
          >
            <ClearIcon boxSize="4" mt="0.5" aria-hidden />
            <Text>
              Standard plate, nothing conflicts: {standard.map((p) => p.dessertName).join(', ')}.
            </Text>
          </HStack>
        )}
        {guest.plates.length === 0 && (
          <HStack gap="2" color="fg.muted">
            <TraceIcon boxSize="4" aria-hidden />
            <Text>This menu has no desserts to check.</Text>
          </HStack>
        )}
      </Stack>
    </Box>
  );
}
