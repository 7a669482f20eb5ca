import { StyleSheet, View } from 'react-native';

import { Banner } from '@/components/ui/Banner';
import { Text } from '@/components/ui/Text';
import { TextLink } from '@/components/ui/TextLink';
import type { ServerInfo } from '@/lib/api/types';
import { space } from '@/lib/theme';

import { formStyles } from './form-styles';

interface Props {
  serverInfo: ServerInfo | undefined;
  email: string;
  /** What the link is for, in the sentence "… can print your link to …". */
  purpose: string;
}

/**
 * When the server has no mail server, says where the e-mailed link can be had instead: the Mail outbox under
 * `npm run dev`, otherwise the server's own console, where whoever runs it prints the link.
 */
export function NoMailNotice({ serverInfo, email, purpose }: Props) {
  if (!serverInfo?.outbox) return null;
  if (serverInfo.outboxOpen) {
    return (
      <Banner tone="info" title="No mail server here">
        <View style={formStyles.row}>
          <Text>This server keeps e-mail in its</Text>
          <TextLink href="/outbox">Mail outbox</TextLink>
        </View>
      </Banner>
    );
  }
  return (
    <Banner tone="info" title="This server has no e-mail set up">
      <Text>{`No message can leave it. Whoever runs the server can print your one-time link to ${purpose} on its console:`}</Text>
      <Text selectable style={styles.command}>{`npm run reset-link -- ${email || 'you@example.com'}`}</Text>
    </Banner>
  );
}

const styles = StyleSheet.create({
  command: { fontFamily: 'monospace', paddingVertical: space.xs },
});
