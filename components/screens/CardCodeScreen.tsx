import { Redirect, useLocalSearchParams } from 'expo-router';

import { AuthFrame } from '@/components/auth/AuthFrame';
import { Text, TextLink } from '@/components/ui';
import { parseCardCode } from '@/lib/recipes/card';

/** A card's short code (recipe, version, batch) opens the same card, e.g. on a phone on the floor. */
export default function CardCodeScreen() {
  const { code } = useLocalSearchParams<{ code: string }>();
  const parsed = parseCardCode(code ?? '');
  if (!parsed) {
    return (
      <AuthFrame>
        <Text variant="heading" level={1}>
          Unknown card code
        </Text>
        <Text variant="muted">“{code}” is not a card code. Codes look like 12-3-b150.</Text>
        <TextLink href="/recipes">Go to the recipes</TextLink>
      </AuthFrame>
    );
  }
  return (
    <Redirect
      href={`/print/${parsed.recipeId}?version=${parsed.version}&kind=${parsed.batch.kind}&value=${parsed.batch.value}`}
    />
  );
}
