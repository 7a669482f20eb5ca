import { useLocalSearchParams, useRouter } from 'expo-router';

import { HouseIngredientForm } from '@/components/ingredients/HouseIngredientForm';
import { Banner, Card, Loading, Screen } from '@/components/ui';
import { useIngredientQuery, useUpdateIngredientMutation } from '@/lib/api/ingredients';

export default function EditIngredientScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const router = useRouter();
  const ingredient = useIngredientQuery(Number(id));
  const update = useUpdateIngredientMutation();
  if (ingredient.isError)
    return (
      <Screen title="Ingredient">
        <Banner tone="danger">{ingredient.error.message}</Banner>
      </Screen>
    );
  if (!ingredient.data) return <Loading />;
  return (
    <Screen
      title={`Edit ${ingredient.data.name}`}
      subtitle="Values are shown per 100 g; enter a label's serving instead if that is easier."
      maxWidth={900}
    >
      {ingredient.data.scope === 'dataset' ? (
        <Banner tone="caution">Dataset ingredients are read-only. Copy it to a house ingredient to change it.</Banner>
      ) : (
        <Card>
          <HouseIngredientForm
            ingredient={ingredient.data}
            submitLabel="Save changes"
            error={update.error}
            onSubmit={async (input) => {
              await update.mutateAsync({ id: ingredient.data.id, input });
              router.replace(`/ingredients/${ingredient.data.id}`);
            }}
          />
        </Card>
      )}
    </Screen>
  );
}
