import { useRouter } from 'expo-router';

import { HouseIngredientForm } from '@/components/ingredients/HouseIngredientForm';
import { Card, Screen } from '@/components/ui';
import { useCreateIngredientMutation } from '@/lib/api/ingredients';

export default function NewIngredientScreen() {
  const router = useRouter();
  const create = useCreateIngredientMutation();
  return (
    <Screen
      title="New house ingredient"
      subtitle="Enter the values from the product label for one serving."
      maxWidth={900}
    >
      <Card>
        <HouseIngredientForm
          submitLabel="Save ingredient"
          error={create.error}
          onSubmit={async (input) => {
            const created = await create.mutateAsync(input);
            router.replace(`/ingredients/${created.id}`);
          }}
        />
      </Card>
    </Screen>
  );
}
