import * as DocumentPicker from 'expo-document-picker';
import { useState } from 'react';
import { Linking, StyleSheet, View } from 'react-native';

import { Button, Card, FormStatus, Text } from '@/components/ui';
import { useAttachmentsQuery, useDeleteAttachmentMutation, useUploadAttachmentMutation } from '@/lib/api/ingredients';
import { env } from '@/lib/env';
import { formatDate } from '@/lib/format';
import { space } from '@/lib/theme';
import { formatNumber } from '@/lib/units';

const ACCEPTED = ['application/pdf', 'image/jpeg', 'image/png'];

/** The supplier's spec sheet or a photo of the label, kept with a house ingredient. */
export function Attachments({ ingredientId, canUpload }: { ingredientId: number; canUpload: boolean }) {
  const list = useAttachmentsQuery(ingredientId, true);
  const upload = useUploadAttachmentMutation(ingredientId);
  const remove = useDeleteAttachmentMutation(ingredientId);
  // Deleting asks once more, on the same row: the file cannot be brought back.
  const [confirming, setConfirming] = useState<number | null>(null);
  const pick = async () => {
    const result = await DocumentPicker.getDocumentAsync({
      type: ACCEPTED,
      multiple: false,
      base64: false,
      copyToCacheDirectory: false,
    });
    const asset = result.canceled ? null : result.assets[0];
    if (!asset) return;
    const file = asset.file ?? (await (await fetch(asset.uri)).blob());
    upload.mutate({ file, name: asset.name });
  };
  return (
    <Card title="Spec sheets and label photos">
      <FormStatus error={upload.error ?? remove.error} />
      {list.data && list.data.length === 0 ? <Text variant="muted">No files yet.</Text> : null}
      {list.data?.map((a) => (
        <View key={a.id} style={styles.row}>
          <Button
            label={a.name}
            accessibleName={`Open ${a.name}`}
            variant="quiet"
            onPress={() => Linking.openURL(`${env.apiUrl}${a.url}`)}
          />
          <Text variant="small">
            {formatNumber(a.sizeBytes / 1024, 0)} KB · {a.uploadedBy ?? 'someone'} · {formatDate(a.createdAt)}
          </Text>
          {canUpload && confirming !== a.id ? (
            <Button
              label="Delete"
              accessibleName={`Delete ${a.name}`}
              variant="quiet"
              onPress={() => setConfirming(a.id)}
            />
          ) : null}
          {canUpload && confirming === a.id ? (
            <>
              <Button
                label="Delete for good"
                accessibleName={`Delete ${a.name} for good`}
                variant="danger"
                busy={remove.isPending}
                onPress={() => remove.mutate(a.id, { onSettled: () => setConfirming(null) })}
              />
              <Button label="Keep" variant="quiet" onPress={() => setConfirming(null)} />
            </>
          ) : null}
        </View>
      ))}
      {canUpload ? (
        <View style={styles.row}>
          <Button
            label="Attach a PDF, JPEG or PNG"
            variant="secondary"
            busy={upload.isPending}
            onPress={() => void pick()}
          />
          <Text variant="small">Up to 10 MB.</Text>
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
});
