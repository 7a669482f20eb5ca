import { Formik } from 'formik';
import { StyleSheet, View } from 'react-native';

import {
  Banner,
  Button,
  FormField,
  FormNumberField,
  FormStatus,
  Segmented,
  Select,
  submitTo,
  Text,
} from '@/components/ui';
import type { Organisation } from '@/lib/api/types';
import { CURRENCIES } from '@/lib/format';
import { check, parseNumber } from '@/lib/forms';
import { type OrganisationInput, organisationSchema } from '@/lib/schemas/team';
import { space } from '@/lib/theme';

interface Props {
  organisation: Organisation;
  onSubmit: (input: OrganisationInput) => Promise<unknown>;
  error: unknown;
  saved: boolean;
}

type Values = {
  name: string;
  abvLimitPercent: string;
  warmestTempC: string;
  ratingSharePercent: string;
  lotPrefix: string;
  currency: string;
  licensed: 'no' | 'yes';
};
const toInput = (v: Values) => ({
  name: v.name,
  abvLimitPercent: parseNumber(v.abvLimitPercent),
  warmestTempC: parseNumber(v.warmestTempC),
  ratingSharePercent: parseNumber(v.ratingSharePercent),
  lotPrefix: v.lotPrefix,
  currency: v.currency,
  licensedForAlcohol: v.licensed === 'yes',
});

/** The brewery's name, the alcohol limit, the warm-day temperature every calculation checks against, and the sugar helpers' margin. */
export function BrewerySettingsForm({ organisation, onSubmit, error, saved }: Props) {
  return (
    <Formik<Values>
      initialValues={{
        name: organisation.name,
        abvLimitPercent: String(organisation.abvLimitPercent),
        warmestTempC: String(organisation.warmestTempC),
        ratingSharePercent: String(organisation.ratingSharePercent),
        lotPrefix: organisation.lotPrefix,
        currency: organisation.currency,
        licensed: organisation.licensedForAlcohol ? 'yes' : 'no',
      }}
      enableReinitialize
      validate={(values) => check(organisationSchema, toInput(values)).errors}
      onSubmit={submitTo((values) => onSubmit(check(organisationSchema, toInput(values)).value!))}
    >
      {({ handleSubmit, isSubmitting, dirty, values, setFieldValue }) => (
        <View style={styles.form}>
          <FormStatus error={error} />
          {saved && !dirty ? <Banner tone="success">Brewery settings saved.</Banner> : null}
          <FormField name="name" label="Brewery name" />
          <FormNumberField
            name="abvLimitPercent"
            label="Alcohol limit for non-alcoholic drinks"
            unit="% ABV"
            hint="0.5 % ABV in the US. Other countries draw the line elsewhere: follow your local rules."
          />
          <FormNumberField
            name="warmestTempC"
            label="Warmest the bottles may meet"
            unit="°C"
            hint="A closed car, a shop window, a summer delivery. Every pressure check includes this temperature, whatever else is asked."
          />
          <FormNumberField
            name="ratingSharePercent"
            label="Most sugar: share of the bottle rating"
            unit="%"
            hint="The sugar helpers never offer more than keeps the worst case at this share of the bottle's rating on the warmest day. 80 % leaves a margin for bottles that are weaker than rated."
          />
          <FormField
            name="lotPrefix"
            label="Lot code prefix"
            autoCapitalize="characters"
            hint="Starts every lot code, e.g. WCD in WCD-261202-02: 1 to 8 letters or digits."
          />
          <Select
            compact
            label="Currency of ingredient costs"
            value={values.currency}
            onChange={(v) => setFieldValue('currency', v)}
            options={CURRENCIES.map((c) => ({ value: c, label: c }))}
          />
          <Segmented
            label="Licensed to make alcoholic beverages"
            value={values.licensed}
            onChange={(v) => setFieldValue('licensed', v)}
            options={[
              { value: 'no', label: 'No' },
              { value: 'yes', label: 'Yes, we hold the licences' },
            ]}
          />
          <Text variant="small">
            {values.licensed === 'yes'
              ? 'Versions at or over the alcohol limit can be approved. Who declared this, and when, is recorded.'
              : 'A version whose worst-case alcohol reaches the limit cannot be approved, with or without an override.'}
          </Text>
          <Button
            label="Save settings"
            busy={isSubmitting}
            disabled={!dirty}
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
