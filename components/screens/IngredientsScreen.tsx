import { useRouter } from 'expo-router';
import { useState } from 'react';

import { IngredientList } from '@/components/ingredients/IngredientList';
import { Button, Card, Screen } from '@/components/ui';
import { useSessionQuery } from '@/lib/api/session';
import { can } from '@/lib/roles';

export default function IngredientsScreen() {
  const router = useRouter();
  const { data: session } = useSessionQuery();
  const [showArchived, setShowArchived] = useState(false);
  const canEdit = can(session?.user.role, 'ingredients.edit');
  return (
    <Screen
      title="Ingredients"
      subtitle="Sugar and composition per gram, from the USDA nutrient database and your own house ingredients."
      actions={canEdit ? <Button label="New house ingredient" onPress={() => router.push('/ingredients/new')} /> : null}
    >
      <Card
        aside={
          <Button
            label={showArchived ? 'Show current' : 'Show archived'}
            variant="quiet"
            onPress={() => setShowArchived(!showArchived)}
          />
        }
        title={showArchived ? 'Archived house ingredients' : 'Library'}
      >
        <IngredientList key={String(showArchived)} showArchived={showArchived} />
      </Card>
    </Screen>
  );
}
