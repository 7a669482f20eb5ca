import { Text, TextInput, View } from 'react-native';

/**
 * The reference for `npm run bench:web`: an Expo Router app with one screen and one text field, nothing else. Its
 * first load on the phone profile is the yardstick the sign-in screen is measured against.
 */
export default function Empty() {
  return (
    <View>
      <Text>Sign in</Text>
      <TextInput aria-label="E-mail" />
    </View>
  );
}
