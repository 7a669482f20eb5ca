import { BatchList } from '@/components/batches/BatchList';
import { Screen } from '@/components/ui';

export default function BatchesScreen() {
  return (
    <Screen
      title="Batches"
      subtitle="Production and trial batches: lot codes, readings, ingredient lots and decisions."
    >
      <BatchList />
    </Screen>
  );
}
