import '@/components/print/print.css';

import { Link, useLocalSearchParams } from 'expo-router';
import { Linking, Platform, ScrollView, StyleSheet, View } from 'react-native';

import { RecipeCardView } from '@/components/print/RecipeCardView';
import { Banner, Button, Loading } from '@/components/ui';
import { cardQuery, useCardQuery } from '@/lib/api/recipes';
import { env } from '@/lib/env';
import { colors, fontSize, space } from '@/lib/theme';

/** The printable card of a recipe version at a batch size, outside the app's frame so that only the card prints. */
export default function PrintCardScreen() {
  const params = useLocalSearchParams<{
    id: string;
    version?: string;
    kind?: string;
    value?: string;
    units?: string;
  }>();
  const query = cardQuery({
    kind: params.kind ?? 'bottles',
    value: params.value ?? '',
    units: params.units ?? 'metric',
    version: params.version,
  });
  const card = useCardQuery(Number(params.id), query);
  return (
    <ScrollView style={styles.scroll} contentContainerStyle={styles.content} dataSet={{ printScroll: 'yes' }}>
      <View role="main" style={styles.inner}>
        <View style={styles.actions} dataSet={{ print: 'hide' }}>
          {Platform.OS === 'web' ? <Button label="Print" onPress={() => window.print()} /> : null}
          <Button
            label="Download PDF"
            variant="secondary"
            onPress={() => Linking.openURL(`${env.apiUrl}/api/recipes/${params.id}/card.pdf?${query}`)}
          />
          <Link href={`/recipes/${params.id}`} style={styles.back}>
            Back to the recipe
          </Link>
        </View>
        {card.isError ? <Banner tone="danger">{card.error.message}</Banner> : null}
        {card.data ? (
          <RecipeCardView card={card.data} />
        ) : card.isPending ? (
          <Loading label="Preparing the card…" />
        ) : null}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.background },
  content: { padding: space.lg },
  inner: { width: '100%', maxWidth: 820, alignSelf: 'center', gap: space.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'center' },
  back: { color: colors.primary, textDecorationLine: 'underline', fontSize: fontSize.md },
});
