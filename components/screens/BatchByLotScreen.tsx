import { Redirect, useLocalSearchParams } from 'expo-router';

import { Banner, Loading, Screen } from '@/components/ui';
import { useBatchByLotQuery } from '@/lib/api/batches';

/** `/b/<lot code>`, as printed on the card and the record: opens that batch. */
export default function LotCodeScreen() {
  const { lot } = useLocalSearchParams<{ lot: string }>();
  const batch = useBatchByLotQuery(lot ?? '');
  if (batch.isError)
    return (
      <Screen title={`Lot ${lot}`}>
        <Banner tone="danger">{batch.error.message}</Banner>
      </Screen>
    );
  if (!batch.data) return <Loading />;
  return <Redirect href={`/batches/${batch.data.id}`} />;
}
