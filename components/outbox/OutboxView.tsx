import { useState } from 'react';
import { Pressable, StyleSheet, View, type ViewStyle } from 'react-native';

import { Badge, Banner, Button, Card, EmptyState, Loading, Text } from '@/components/ui';
import { useOutboxQuery } from '@/lib/api/outbox';
import type { OutboxMessage } from '@/lib/api/types';
import { formatDateTime } from '@/lib/format';
import { colors, fonts, radius, space } from '@/lib/theme';

import { MessageText } from './MessageText';

const KIND_LABELS: Record<string, string> = { invitation: 'Invitation', 'password-reset': 'Password reset' };
const when = formatDateTime;

/** The local outbox: the e-mails this server would have sent, newest first, each readable with its links. */
export function OutboxView() {
  const outbox = useOutboxQuery();
  const [openId, setOpenId] = useState<number | null>(null);
  if (outbox.isPending) return <Loading label="Reading the outbox…" />;
  if (outbox.isError) return <Banner tone="danger">{outbox.error.message}</Banner>;
  const { messages, open } = outbox.data;
  const selected = messages.find((m) => m.id === openId) ?? null;
  return (
    <View style={styles.wrap}>
      <Banner tone="info" title="E-mail stays on this server">
        {open
          ? 'No mail server is set up, so messages are kept here instead of being sent. In development everyone can read them.'
          : 'No mail server is set up, so messages are kept here instead of being sent.'}
      </Banner>
      <View style={styles.row}>
        <Button label="Refresh" variant="secondary" busy={outbox.isFetching} onPress={() => outbox.refetch()} />
      </View>
      {messages.length === 0 ? (
        <EmptyState title="No messages yet" message="Invitations and password-reset e-mails appear here." />
      ) : (
        <View role="list" aria-label="Messages" style={styles.list}>
          {messages.map((message) => (
            <MessageRow
              key={message.id}
              message={message}
              open={message.id === openId}
              onPress={() => setOpenId(message.id === openId ? null : message.id)}
            />
          ))}
        </View>
      )}
      {selected ? (
        <Card title={selected.subject}>
          <Text variant="small">
            To {selected.to} · {when(selected.createdAt)}
          </Text>
          <MessageText text={selected.text} />
        </Card>
      ) : null}
    </View>
  );
}

function MessageRow({ message, open, onPress }: { message: OutboxMessage; open: boolean; onPress: () => void }) {
  return (
    <Pressable
      role="listitem"
      aria-label={`${message.subject}, to ${message.to}`}
      aria-expanded={open}
      onPress={onPress}
      style={(state) => {
        const { focused, hovered } = state as typeof state & { focused?: boolean; hovered?: boolean };
        return [styles.item, open && styles.itemOpen, hovered && styles.itemHover, focused && styles.focus];
      }}
    >
      <View style={styles.itemText}>
        <Text style={styles.subject}>{message.subject}</Text>
        <Text variant="small">
          To {message.to} · {when(message.createdAt)}
        </Text>
      </View>
      <Badge label={KIND_LABELS[message.kind] ?? message.kind} />
    </Pressable>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  row: { flexDirection: 'row', gap: space.sm },
  list: { gap: space.sm },
  item: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: space.md,
    minHeight: 56,
    padding: space.md,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.hairline,
    backgroundColor: colors.surface,
  },
  itemOpen: { borderColor: colors.primary },
  itemHover: { backgroundColor: colors.surfaceMuted },
  focus: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid' } as ViewStyle,
  itemText: { flexShrink: 1 },
  subject: { fontFamily: fonts.semibold },
});
