import { Box, Grid, Heading, HStack, List, Stack, Text } from '@chakra-ui/react';
import { Photo } from '../../../components/ui/photo';
import type { PublicComponent, PublicDessert } from '../api/types';
import { AllergenDeclaration } from './allergen-declaration';
import { DietaryFlags } from './dietary-flags';

function portion(c: PublicComponent): string {
  const grams = `${c.grams.toLocaleString('en-GB')} g`;
  if (c.unit === 'piece') return `${c.quantity} ${c.quantity === 1 ? 'piece' : 'pieces'}, ${grams}`;
  return grams;
}

/** One plated dessert of a menu: photo, description, its components, allergens and diet. */
export function DessertSection({ dessert, index }: { dessert: PublicDessert; index: number }) {
  const headingId = `dessert-${dessert.id}`;
  return (
    <Box as="article" aria-labelledby={headingId} borderTopWidth="1px" borderColor="border" pt="8">
      <Grid templateColumns={{ base: '1fr', md: '5fr 7fr' }} gap={{ base: '5', md: '8' }}>
        <Photo
          photo={dessert.photos[0]}
          alt={`${dessert.name}, as plated`}
          borderRadius="l3"
          sizes="(min-width: 48em) 40vw, 100vw"
        />
        <Stack gap="5">
          <Stack gap="2">
            <Text
              textStyle="xs"
              fontWeight="semibold"
              letterSpacing="0.12em"
              textTransform="uppercase"
              color="caramel.fg"
            >
              Dessert {index + 1}
            </Text>
            <Heading as="h3" id={headingId} fontSize="2xl" fontWeight="normal">
              {dessert.name}
            </Heading>
            {dessert.description && <Text color="fg.muted">{dessert.description}</Text>}
          </Stack>
          <Stack gap="2">
            <Heading as="h4" fontFamily="body" fontSize="sm" fontWeight="semibold">
              On the plate
            </Heading>
            <List.Root as="ul" gap="1" listStyleType="none">
              {dessert.components.map((c) => (
                <List.Item
                  key={c.name}
                  display="flex"
                  justifyContent="space-between"
                  gap="4"
                  textStyle="sm"
                  borderBottomWidth="1px"
                  borderColor="border.muted"
                  py="1.5"
                >
                  <span>{c.name}</span>
                  <Text as="span" color="fg.muted" whiteSpace="nowrap">
                    {portion(c)}
                  </Text>
                </List.Item>
              ))}
            </List.Root>
          </Stack>
          <AllergenDeclaration allergens={dessert.allergens} idPrefix={headingId} />
          <HStack>
            <DietaryFlags dietary={dessert.dietary} label={`Dietary facts of ${dessert.name}`} />
          </HStack>
        </Stack>
      </Grid>
    </Box>
  );
}
