import { Segmented } from '@/components/ui';
import { useSessionQuery, useUpdatePreferencesMutation } from '@/lib/api/session';
import type { UnitSystem } from '@/lib/units';

/** Metric or US units, remembered for the signed-in person. */
export function UnitToggle() {
  const { data: session } = useSessionQuery();
  const save = useUpdatePreferencesMutation();
  if (!session) return null;
  return (
    <Segmented<UnitSystem>
      label="Units"
      showLabel={false}
      value={session.user.unitSystem}
      onChange={(unitSystem) => save.mutate({ unitSystem })}
      options={[
        { value: 'metric', label: 'Metric' },
        { value: 'us', label: 'US' },
      ]}
    />
  );
}
