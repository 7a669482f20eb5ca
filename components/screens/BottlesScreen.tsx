import { useState } from 'react';

import { BottleFormatForm } from '@/components/bottles/BottleFormatForm';
import { BottleFormatsTable } from '@/components/bottles/BottleFormatsTable';
import { Banner, Button, Card, Loading, Screen } from '@/components/ui';
import { Cautions } from '@/components/ui/calculations/Cautions';
import {
  type BottleFormat,
  useBottleFormatsQuery,
  useCreateBottleFormatMutation,
  useUpdateBottleFormatMutation,
} from '@/lib/api/bottle-formats';
import { useSessionQuery } from '@/lib/api/session';
import { can } from '@/lib/roles';

export default function BottlesScreen() {
  const { data: session } = useSessionQuery();
  const canEdit = can(session?.user.role, 'bottles.edit');
  const [showArchived, setShowArchived] = useState(false);
  const formats = useBottleFormatsQuery(showArchived);
  const [editing, setEditing] = useState<BottleFormat | 'new' | null>(null);
  const create = useCreateBottleFormatMutation();
  const update = useUpdateBottleFormatMutation();
  if (!session) return null;
  return (
    <Screen
      title="Bottles"
      subtitle="The containers your brewery fills and the pressure each is rated for."
      actions={canEdit && editing === null ? <Button label="Add a format" onPress={() => setEditing('new')} /> : null}
    >
      {editing !== null ? (
        <Card title={editing === 'new' ? 'New bottle format' : `Edit ${editing.name}`}>
          <BottleFormatForm
            key={editing === 'new' ? 'new' : editing.id}
            format={editing === 'new' ? undefined : editing}
            error={editing === 'new' ? create.error : update.error}
            onCancel={() => setEditing(null)}
            onSubmit={(input) =>
              editing === 'new' ? create.mutateAsync(input) : update.mutateAsync({ id: editing.id, input })
            }
          />
        </Card>
      ) : null}
      {canEdit ? null : (
        <Banner tone="info">Only owners change this table. Ask an owner to add a bottle you use.</Banner>
      )}
      <Card
        title="Formats"
        aside={
          <Button
            label={showArchived ? 'Hide archived' : 'Show archived'}
            variant="quiet"
            onPress={() => setShowArchived(!showArchived)}
          />
        }
      >
        {formats.isError ? <Banner tone="danger">{formats.error.message}</Banner> : null}
        {formats.data ? (
          <BottleFormatsTable
            formats={formats.data}
            units={session.user.unitSystem}
            canEdit={canEdit}
            onEdit={setEditing}
          />
        ) : (
          <Loading />
        )}
      </Card>
      <Cautions />
    </Screen>
  );
}
