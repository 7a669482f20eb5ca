import { useLocalSearchParams } from 'expo-router';

import { BatchView } from '@/components/batches/BatchView';
import { Banner, Loading, Screen } from '@/components/ui';
import { useBatchQuery } from '@/lib/api/batches';
import { useSessionQuery } from '@/lib/api/session';

export default function BatchScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const batch = useBatchQuery(Number(id));
  const { data: session } = useSessionQuery();
  if (batch.isError)
    return (
      <Screen title="Batch">
        <Banner tone="danger">{batch.error.message}</Banner>
      </Screen>
    );
  if (!batch.data || !session) return <Loading />;
  return (
    <Screen
      title={`Batch ${batch.data.lotCode}`}
      subtitle={`${batch.data.recipeName}, version ${batch.data.version}`}
      maxWidth={960}
    >
      <BatchView batch={batch.data} role={session.user.role} />
    </Screen>
  );
}
