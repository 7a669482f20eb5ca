import { Formik, setIn, useFormikContext } from 'formik';
import { useEffect, useRef } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';

import { Banner, Card, Loading } from '@/components/ui';
import { CarbonationResults } from '@/components/ui/calculations/CarbonationResults';
import { SummaryStrip } from '@/components/ui/calculations/SummaryStrip';
import type { BottleFormat } from '@/lib/api/bottle-formats';
import { useCarbonationQuery } from '@/lib/api/calculations';
import { useDebouncedValue } from '@/lib/hooks/use-debounced-value';
import {
  CHART_TEMPERATURES_C,
  convertQuickCheckValues,
  initialQuickCheckValues,
  type QuickCheckValues,
  toCarbonationRequest,
} from '@/lib/quick-check';
import { breakpoints, space } from '@/lib/theme';
import type { UnitSystem } from '@/lib/units';

import { BrixCard } from './BrixCard';
import { PrimingHelper } from './PrimingHelper';
import { QuickCheckInputs } from './QuickCheckInputs';

const TEMPERATURE_NAMES = ['Conditioning room', 'Cold store', 'Highest'];

interface Props {
  formats: BottleFormat[];
  units: UnitSystem;
  limitPercent: number;
}

/** The Quick check: inputs beside live results on a wide screen, one after the other on a phone. */
export function QuickCheck({ formats, units, limitPercent }: Props) {
  const initial = initialQuickCheckValues(units);
  const firstFormat = formats.find((f) => f.liquidMl === 500 && f.closure === 'crown-cap') ?? formats[0];
  if (firstFormat) {
    initial.bottleFormatId = String(firstFormat.id);
  }
  return (
    <Formik<QuickCheckValues>
      initialValues={initial}
      onSubmit={() => undefined}
      validate={(values) => {
        const { errors } = toCarbonationRequest(values, units);
        return Object.entries(errors).reduce<Record<string, unknown>>(
          (all, [path, message]) => setIn(all, path, message),
          {},
        );
      }}
      validateOnMount
    >
      <Layout units={units} formats={formats} limitPercent={limitPercent} />
    </Formik>
  );
}

function Layout({ units, formats, limitPercent }: Props) {
  const { width } = useWindowDimensions();
  const wide = width >= breakpoints.wide;
  useConvertOnUnitChange(units);
  return (
    <View style={[styles.layout, wide && styles.layoutWide]}>
      {wide ? null : <PhoneSummary units={units} />}
      <View style={[styles.inputs, wide && styles.inputsWide]}>
        <QuickCheckInputs formats={formats} units={units} />
        <PrimingHelper units={units} limitPercent={limitPercent} />
        <BrixCard />
      </View>
      <View style={[styles.results, wide && styles.resultsWide]}>
        <LiveResults units={units} limitPercent={limitPercent} />
      </View>
    </View>
  );
}

/** When the person switches units, the numbers they typed are converted rather than reinterpreted. */
function useConvertOnUnitChange(units: UnitSystem) {
  const { values, setValues } = useFormikContext<QuickCheckValues>();
  const previous = useRef(units);
  useEffect(() => {
    if (previous.current !== units) {
      void setValues(convertQuickCheckValues(values, previous.current, units));
      previous.current = units;
    }
  }, [units, values, setValues]);
}

/** The answer for the form's current values (debounced); shared by the results and the phone summary strip. */
function useQuickCheckAnswer(units: UnitSystem) {
  const { values } = useFormikContext<QuickCheckValues>();
  const { request } = toCarbonationRequest(values, units);
  const settled = useDebouncedValue(request);
  const answer = useCarbonationQuery(settled);
  const chart = useCarbonationQuery(settled && { ...settled, temperaturesC: CHART_TEMPERATURES_C });
  return { request, answer, chart };
}

/** On phones the inputs come first, so the key numbers ride along at the top while the person types. */
function PhoneSummary({ units }: { units: UnitSystem }) {
  const { answer } = useQuickCheckAnswer(units);
  return answer.data ? <SummaryStrip result={answer.data} units={units} /> : null;
}

function LiveResults({ units, limitPercent }: { units: UnitSystem; limitPercent: number }) {
  const { request, answer, chart } = useQuickCheckAnswer(units);
  if (answer.isError)
    return (
      <Banner tone="danger" title="Could not work this out">
        {answer.error.message}
      </Banner>
    );
  if (!answer.data) {
    return request ? (
      <Loading label="Working it out…" />
    ) : (
      <Card title="Results">
        <Banner tone="info">Fill in the bottle and sugar to see the numbers.</Banner>
      </Card>
    );
  }
  return (
    <View style={{ opacity: answer.isPlaceholderData || !request ? 0.6 : 1 }}>
      {!request ? (
        <Banner tone="caution">Some inputs need attention: these results are for the last valid values.</Banner>
      ) : null}
      <CarbonationResults
        answer={answer.data}
        chart={chart.data}
        units={units}
        limitPercent={limitPercent}
        temperatureNames={TEMPERATURE_NAMES}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  layout: { gap: space.lg },
  layoutWide: { flexDirection: 'row', alignItems: 'flex-start' },
  inputs: { gap: space.lg },
  inputsWide: { flex: 5, minWidth: 380 },
  results: { gap: space.lg },
  resultsWide: { flex: 6 },
});
