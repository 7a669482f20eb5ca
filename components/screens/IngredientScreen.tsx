import { useLocalSearchParams, useRouter } from 'expo-router';

import { IngredientDetail } from '@/components/ingredients/IngredientDetail';
import { Banner, Button, FormStatus, Loading, Screen } from '@/components/ui';
import { useArchiveIngredientMutation, useCopyIngredientMutation, useIngredientQuery } from '@/lib/api/ingredients';
import { useSessionQuery } from '@/lib/api/session';
import { can } from '@/lib/roles';

export default function IngredientScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const router = useRouter();
  const { data: session } = useSessionQuery();
  const ingredient = useIngredientQuery(Number(id));
  const copy = useCopyIngredientMutation();
  const archive = useArchiveIngredientMutation();
  const canEdit = can(session?.user.role, 'ingredients.edit');
  if (ingredient.isError)
    return (
      <Screen title="Ingredient">
        <Banner tone="danger">{ingredient.error.message}</Banner>
      </Screen>
    );
  if (!ingredient.data) return <Loading />;
  const item = ingredient.data;
  const actions = canEdit ? (
    <>
      {item.scope === 'house' ? (
        <Button label="Edit" onPress={() => router.push(`/ingredients/edit/${item.id}`)} />
      ) : null}
      <Button
        label="Copy to a house ingredient"
        variant="secondary"
        busy={copy.isPending}
        onPress={() =>
          copy.mutate(
            { id: item.id, name: `${item.displayName} (house copy)`.slice(0, 200) },
            { onSuccess: (created) => router.push(`/ingredients/edit/${created.id}`) },
          )
        }
      />
      {item.scope === 'house' ? (
        <Button
          label={item.archived ? 'Restore' : 'Archive'}
          variant="quiet"
          busy={archive.isPending}
          onPress={() => archive.mutate({ id: item.id, archived: !item.archived })}
        />
      ) : null}
    </>
  ) : null;
  return (
    <Screen title={item.displayName} actions={actions}>
      <FormStatus error={copy.error ?? archive.error} />
      <IngredientDetail ingredient={item} canEdit={canEdit} />
    </Screen>
  );
}
