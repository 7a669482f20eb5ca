import { useRouter } from 'expo-router';

import { NewRecipeForm } from '@/components/recipes/NewRecipeForm';
import { Card, Loading, Screen } from '@/components/ui';
import { useBottleFormatsQuery } from '@/lib/api/bottle-formats';
import { useCreateRecipeMutation } from '@/lib/api/recipes';

export default function NewRecipeScreen() {
  const router = useRouter();
  const formats = useBottleFormatsQuery();
  const create = useCreateRecipeMutation();
  if (!formats.data) return <Loading />;
  return (
    <Screen
      title="New recipe"
      subtitle="Name it, choose the bottle and how the flavour goes in; then build it in the designer."
      maxWidth={760}
    >
      <Card>
        <NewRecipeForm
          formats={formats.data}
          error={create.error}
          onCreate={async (input) => {
            const created = await create.mutateAsync(input);
            router.replace(`/recipes/${created.id}`);
          }}
        />
      </Card>
    </Screen>
  );
}
