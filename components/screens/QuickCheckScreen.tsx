import { QuickCheck } from '@/components/quick-check/QuickCheck';
import { Banner, Loading, Screen } from '@/components/ui';
import { UnitToggle } from '@/components/ui/calculations/UnitToggle';
import { useBottleFormatsQuery } from '@/lib/api/bottle-formats';
import { useSessionQuery } from '@/lib/api/session';

export default function QuickCheckScreen() {
  const { data: session } = useSessionQuery();
  const formats = useBottleFormatsQuery();
  if (!session) return null;
  return (
    <Screen
      title="Quick check"
      subtitle="Sugar, fizz, bottle pressure and alcohol for one bottle, before anything is sealed."
      actions={<UnitToggle />}
      maxWidth={1400}
    >
      {formats.isError ? <Banner tone="danger">{formats.error.message}</Banner> : null}
      {formats.data ? (
        <QuickCheck
          formats={formats.data}
          units={session.user.unitSystem}
          limitPercent={session.organisation.abvLimitPercent}
        />
      ) : (
        <Loading />
      )}
    </Screen>
  );
}
