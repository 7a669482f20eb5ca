import { Formik } from 'formik';
import { StyleSheet, View } from 'react-native';

import type { Organisation } from '@/lib/api/types';
import { check, parseNumber } from '@/lib/forms';
import { organisationSchema, type OrganisationInput } from '@/lib/schemas/team';
import { space } from '@/lib/theme';

import { Banner, Button, FormField, FormStatus, submitTo } from '../ui';

interface Props {
  organisation: Organisation;
  onSubmit: (input: OrganisationInput) => Promise<unknown>;
  error: unknown;
  saved: boolean;
}

const toInput = (v: { name: string; abvLimitPercent: string; warmestTempC: string }) => ({ name: v.name, abvLimitPercent: parseNumber(v.abvLimitPercent), warmestTempC: parseNumber(v.warmestTempC) });

/** The brewery's name, the alcohol limit and the warm-day temperature every calculation checks against. */
export function BrewerySettingsForm({ organisation, onSubmit, error, saved }: Props) {
  return (
    <Formik
      initialValues={{ name: organisation.name, abvLimitPercent: String(organisation.abvLimitPercent), warmestTempC: String(organisation.warmestTempC) }}
      enableReinitialize
      validate={(values) => check(organisationSchema, toInput(values)).errors}
      onSubmit={submitTo((values) => onSubmit(check(organisationSchema, toInput(values)).value!))}
    >
      {({ handleSubmit, isSubmitting, dirty }) => (
        <View style={styles.form}>
          <FormStatus error={error} />
          {saved && !dirty ? <Banner tone="success">Brewery settings saved.</Banner> : null}
          <FormField name="name" label="Brewery name" />
          <FormField
            name="abvLimitPercent"
            label="Alcohol limit for non-alcoholic drinks"
            suffix="% ABV"
            inputMode="decimal"
            hint="0.5 % ABV in the US. Other countries draw the line elsewhere: follow your local rules."
          />
          <FormField
            name="warmestTempC"
            label="Warmest the bottles may meet"
            suffix="°C"
            inputMode="decimal"
            hint="A closed car, a shop window, a summer delivery. Every pressure check includes this temperature, whatever else is asked."
          />
          <Button label="Save settings" busy={isSubmitting} disabled={!dirty} onPress={() => handleSubmit()} style={styles.submit} />
        </View>
      )}
    </Formik>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  submit: { alignSelf: 'flex-start' },
});
