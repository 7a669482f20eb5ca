import { Formik } from 'formik';
import { StyleSheet, View } from 'react-native';
import * as yup from 'yup';

import { Button, FormField, FormStatus, Segmented, Select, submitTo } from '@/components/ui';
import type { BottleFormat } from '@/lib/api/types';
import { check } from '@/lib/forms';
import { defaultContent } from '@/lib/recipes/stages';
import { type CreateRecipeInput, type Method, METHOD_LABELS, METHODS, recipeHeaderFields } from '@/lib/schemas/recipes';
import { space } from '@/lib/theme';

interface Props {
  formats: BottleFormat[];
  onCreate: (input: CreateRecipeInput) => Promise<unknown>;
  error: unknown;
}

type Values = { name: string; bottleFormatId: string; method: Method };

// The name checked by the schema the server uses for it.
const nameSchema = yup.object({ name: recipeHeaderFields.name });

/** A new recipe: its name, bottle format and how the flavour goes in; the designer does the rest. */
export function NewRecipeForm({ formats, onCreate, error }: Props) {
  const first = formats.find((f) => f.liquidMl === 473) ?? formats[0];
  return (
    <Formik<Values>
      initialValues={{ name: '', bottleFormatId: String(first?.id ?? ''), method: 'steep-strain' }}
      validate={(v) => check(nameSchema, { name: v.name }).errors}
      onSubmit={submitTo((v) =>
        onCreate({
          name: v.name.trim(),
          flavourNotes: '',
          content: defaultContent(Number(v.bottleFormatId), v.method),
        }),
      )}
    >
      {({ values, setFieldValue, handleSubmit, isSubmitting }) => (
        <View style={styles.form}>
          <FormStatus error={error} />
          <FormField name="name" label="Recipe name" />
          <Select
            compact
            label="Bottle format"
            value={values.bottleFormatId}
            options={formats.map((f) => ({ value: String(f.id), label: f.name }))}
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
            style={styles.submit}
          />
        </View>
      )}
    </Formik>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  submit: { alignSelf: 'flex-start' },
});
