import { HStack, List } from '@chakra-ui/react';
import type { ComponentType } from 'react';
import { GlassIcon, JellyIcon, LeafIcon, SproutIcon } from '../../../components/ui/booking-icons';
import type { PublicDietary } from '../api/types';

const GELATIN_WORDS: Record<string, string> = {
  pork: 'pork',
  beef: 'beef',
  fish: 'fish',
  unknown: 'source not known',
};

interface Flag {
  text: string;
  icon: ComponentType<{ boxSize?: string; color?: string }>;
  positive: boolean;
}

/** The dietary facts of a dish in words: vegan or vegetarian (or not), alcohol, gelatin. */
export function dietaryFlags(dietary: PublicDietary): Flag[] {
  const flags: Flag[] = [];
  if (dietary.vegan) flags.push({ text: 'Vegan', icon: SproutIcon, positive: true });
  else if (dietary.vegetarian) flags.push({ text: 'Vegetarian', icon: LeafIcon, positive: true });
  else flags.push({ text: 'Not vegetarian', icon: LeafIcon, positive: false });
  flags.push(
    dietary.alcohol
      ? { text: 'Contains alcohol', icon: GlassIcon, positive: false }
      : { text: 'No alcohol', icon: GlassIcon, positive: true },
  );
  flags.push(
    dietary.gelatin.length > 0
      ? {
          text: `Contains gelatin (${dietary.gelatin.map((g) => GELATIN_WORDS[g] ?? g).join(', ')})`,
          icon: JellyIcon,
          positive: false,
        }
      : { text: 'No gelatin', icon: JellyIcon, positive: true },
  );
  return flags;
}

export function DietaryFlags({ dietary, label }: { dietary: PublicDietary; label: string }) {
  return (
    <List.Root
      as="ul"
      aria-label={label}
      listStyleType="none"
      display="flex"
      flexDirection="row"
      flexWrap="wrap"
      gap="2"
    >
      {dietaryFlags(dietary).map((flag) => (
        <List.Item key={flag.text}>
          <HStack
            display="inline-flex"
            gap="1.5"
            px="2.5"
            py="1"
            borderRadius="full"
            bg={flag.positive ? 'accent.subtle' : 'bg.muted'}
            color={flag.positive ? 'accent.fg' : 'fg.muted'}
            textStyle="sm"
          >
            <flag.icon boxSize="4" />
            <span>{flag.text}</span>
          </HStack>
        </List.Item>
      ))}
    </List.Root>
  );
}
