import { Formik } from 'formik';
import { StyleSheet, View } from 'react-native';

import { Banner, Button, Card, FormField, FormStatus, submitTo, Text } from '@/components/ui';
import { type Ingredient, useDisplayNameMutation } from '@/lib/api/ingredients';
import { check } from '@/lib/forms';
import { shortIngredientName } from '@/lib/ingredients';
import { displayNameSchema } from '@/lib/schemas/ingredients';
import { space } from '@/lib/theme';

/**
 * A dataset ingredient's name as the brewery reads it in lists, recipes and cards, with the dataset's full
 * description beside it. Those who may edit ingredients can change it, or empty it to go back to the default.
 */
export function DisplayNameForm({ ingredient, canEdit }: { ingredient: Ingredient; canEdit: boolean }) {
  const save = useDisplayNameMutation(ingredient.id);
  const fallback = shortIngredientName(ingredient.name);
  return (
    <Card title="Name">
      <Text variant="small">Full name in the dataset: {ingredient.name}</Text>
      {canEdit ? (
        <Formik
          initialValues={{ displayName: ingredient.displayName }}
          enableReinitialize
          validate={(values) => check(displayNameSchema, values).errors}
          onSubmit={submitTo((values) => save.mutateAsync(values), { schema: displayNameSchema })}
        >
          {({ handleSubmit, isSubmitting, dirty }) => (
            <View style={styles.form}>
              <FormStatus error={save.error} />
              {save.isSuccess && !dirty ? <Banner tone="success">Display name saved.</Banner> : null}
              <FormField
                name="displayName"
                label="Display name"
                hint={`What recipes, cards and batch sheets show. Leave it empty for “${fallback}”.`}
              />
              <Button
                label="Save name"
                variant="secondary"
                busy={isSubmitting}
                disabled={!dirty}
                onPress={() => handleSubmit()}
                style={styles.submit}
              />
            </View>
          )}
        </Formik>
      ) : (
        <Text>Shown in recipes as {ingredient.displayName}.</Text>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md, paddingTop: space.sm },
  submit: { alignSelf: 'flex-start' },
});
