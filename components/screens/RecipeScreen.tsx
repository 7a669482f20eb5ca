import { useLocalSearchParams, useRouter } from 'expo-router';
import { useState } from 'react';

import { HistoryView } from '@/components/recipes/HistoryView';
import { LabelView } from '@/components/recipes/LabelView';
import { RecipeEditor } from '@/components/recipes/RecipeEditor';
import { ReviewPanel } from '@/components/recipes/ReviewPanel';
import { ScaleView } from '@/components/recipes/ScaleView';
import { TastingsView } from '@/components/recipes/TastingsView';
import { Banner, Button, Loading, Screen, Segmented } from '@/components/ui';
import { useBottleFormatsQuery } from '@/lib/api/bottle-formats';
import {
  useArchiveRecipeMutation,
  useDuplicateRecipeMutation,
  useRecipeQuery,
  useSaveRecipeMutation,
} from '@/lib/api/recipes';
import { useSessionQuery } from '@/lib/api/session';
import { can } from '@/lib/roles';

type Tab = 'design' | 'review' | 'tastings' | 'scale' | 'label' | 'history';

export default function RecipeScreen() {
  const { id, tab: asked } = useLocalSearchParams<{ id: string; tab?: string }>();
  const recipeId = Number(id);
  const router = useRouter();
  const { data: session } = useSessionQuery();
  const recipe = useRecipeQuery(recipeId);
  const formats = useBottleFormatsQuery(true);
  const save = useSaveRecipeMutation(recipeId);
  const duplicate = useDuplicateRecipeMutation(recipeId);
  const archive = useArchiveRecipeMutation(recipeId);
  const brewer = !can(session?.user.role, 'recipes.develop');
  // A link may ask for a tab (Home opens a submitted recipe on Review); brewers always start on the batch view.
  const TABS: Tab[] = ['design', 'review', 'tastings', 'scale', 'label', 'history'];
  const [tab, setTab] = useState<Tab>(brewer ? 'scale' : TABS.includes(asked as Tab) ? (asked as Tab) : 'design');
  if (recipe.isError)
    return (
      <Screen title="Recipe">
        <Banner tone="danger">{recipe.error.message}</Banner>
      </Screen>
    );
  if (!recipe.data || !formats.data || !session) return <Loading />;
  const archived = recipe.data.status === 'archived';
  const canEdit = can(session.user.role, 'recipes.edit') && !archived;
  return (
    <Screen
      title={recipe.data.name}
      subtitle={recipe.data.flavourNotes || undefined}
      maxWidth={1400}
      actions={
        can(session.user.role, 'recipes.develop') ? (
          <>
            <Button
              label="Duplicate"
              variant="secondary"
              busy={duplicate.isPending}
              onPress={() => duplicate.mutate(undefined, { onSuccess: (copy) => router.push(`/recipes/${copy.id}`) })}
            />
            <Button
              label={archived ? 'Restore' : 'Archive'}
              variant="quiet"
              busy={archive.isPending}
              onPress={() => archive.mutate(!archived)}
            />
          </>
        ) : null
      }
    >
      {archived ? (
        <Banner tone="info">This recipe is archived: it can be read, duplicated or restored, not changed.</Banner>
      ) : null}
      <Segmented
        label="Part of the recipe"
        showLabel={false}
        value={tab}
        onChange={setTab}
        options={[
          { value: 'design', label: 'Design' },
          { value: 'review', label: 'Review' },
          { value: 'tastings', label: 'Tastings' },
          { value: 'scale', label: brewer ? 'Batch' : 'Scale' },
          { value: 'label', label: 'Label' },
          { value: 'history', label: 'History' },
        ]}
      />
      {tab === 'design' ? (
        <RecipeEditor
          recipe={recipe.data}
          formats={formats.data}
          units={session.user.unitSystem}
          limitPercent={session.organisation.abvLimitPercent}
          canEdit={canEdit}
          saveError={save.error}
          onReload={() => {
            save.reset();
            void recipe.refetch();
          }}
          onSave={(input) => save.mutateAsync({ ...input, note: '' })}
        />
      ) : null}
      {tab === 'tastings' ? (
        <TastingsView
          recipeId={recipeId}
          canEdit={canEdit}
          content={recipe.data.content}
          onShowHistory={() => setTab('history')}
        />
      ) : null}
      {tab === 'review' ? <ReviewPanel recipeId={recipeId} session={session} /> : null}
      {tab === 'scale' ? (
        <ScaleView recipe={recipe.data} units={session.user.unitSystem} productionOnly={brewer} />
      ) : null}
      {tab === 'label' ? (
        <LabelView
          recipeId={recipeId}
          current={recipe.data.currentVersion}
          canEnterLab={can(session.user.role, 'recipes.label')}
        />
      ) : null}
      {tab === 'history' ? (
        <HistoryView recipeId={recipeId} current={recipe.data.currentVersion} canEdit={canEdit} />
      ) : null}
    </Screen>
  );
}
