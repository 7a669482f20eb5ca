import { StyleSheet } from 'react-native';

import { space } from '@/lib/theme';

export const formStyles = StyleSheet.create({
  form: { gap: space.lg, alignSelf: 'stretch' },
  links: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'center' },
});
