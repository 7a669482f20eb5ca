import { useRouter } from 'expo-router';
import { Formik } from 'formik';
import { View } from 'react-native';

import { Button, Card, FormField, FormStatus, Loading, Screen, Segmented, Select } from '@/components/ui';
import { useBottleFormatsQuery } from '@/lib/api/bottle-formats';
import { useCreateRecipeMutation } from '@/lib/api/recipes';
import { defaultContent } from '@/lib/recipes/stages';
import { type Method, METHOD_LABELS, METHODS } from '@/lib/schemas/recipes';

export default function NewRecipeScreen() {
  const router = useRouter();
  const formats = useBottleFormatsQuery();
  const create = useCreateRecipeMutation();
  if (!formats.data) return <Loading />;
  const first = formats.data.find((f) => f.liquidMl === 473) ?? formats.data[0];
  return (
    <Screen
      title="New recipe"
      subtitle="Name it, choose the bottle and how the flavour goes in; then build it in the designer."
      maxWidth={760}
    >
      <Card>
        <Formik
          initialValues={{ name: '', bottleFormatId: String(first?.id ?? ''), method: 'steep-strain' as Method }}
          validate={(v) => (v.name.trim().length < 2 ? { name: 'Name the recipe (at least 2 characters).' } : {})}
          onSubmit={async (v) => {
            const created = await create
              .mutateAsync({
                name: v.name.trim(),
                flavourNotes: '',
                content: defaultContent(Number(v.bottleFormatId), v.method),
              })
              .catch(() => null);
            if (created) router.replace(`/recipes/${created.id}`);
          }}
        >
          {({ values, setFieldValue, handleSubmit, isSubmitting }) => (
            <View style={{ gap: 16 }}>
              <FormStatus error={create.error} />
              <FormField name="name" label="Recipe name" />
              <Select
                compact
                label="Bottle format"
                value={values.bottleFormatId}
                options={formats.data.map((f) => ({ value: String(f.id), label: f.name }))}
                onChange={(id) => setFieldValue('bottleFormatId', id)}
              />
              <Segmented
                label="How the flavour goes in"
                value={values.method}
                onChange={(m) => setFieldValue('method', m)}
                options={METHODS.map((m) => ({ value: m, label: METHOD_LABELS[m] }))}
              />
              <Button
                label="Create and open the designer"
                busy={isSubmitting}
                onPress={() => handleSubmit()}
                style={{ alignSelf: 'flex-start' }}
              />
            </View>
          )}
        </Formik>
      </Card>
    </Screen>
  );
}
