import { Badge, Wrap } from '@chakra-ui/react';
import { AllergyIcon, SpoonIcon } from '../../../components/ui/icons';
import { allergenLabel, dietLabel } from '../lib/allergen-words';

/** A guest's allergens (our triangle) and diets (our spoon), always in words. */
export function RequirementBadges({
  allergens,
  diets,
}: {
  allergens: readonly string[];
  diets: readonly string[];
}) {
  if (allergens.length === 0 && diets.length === 0) return null;
  return (
    <Wrap gap="1.5" as="ul" listStyleType="none" aria-label="Requirements">
      {allergens.map((a) => (
        <li key={`a-${a}`}>
          <Badge variant="subtle" colorPalette="danger" size="lg" gap="1">
            <AllergyIcon boxSize="3.5" aria-hidden />
            Allergy: {allergenLabel(a)}
          </Badge>
        </li>
      ))}
      {diets.map((d) => (
        <li key={`d-${d}`}>
          <Badge variant="subtle" colorPalette="caramel" size="lg" gap="1">
            <SpoonIcon boxSize="3.5" aria-hidden />
            Diet: {dietLabel(d)}
          </Badge>
        </li>
      ))}
    </Wrap>
  );
}
