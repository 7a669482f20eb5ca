import { AuthFrame } from '@/components/auth/AuthFrame';
import { Text } from '@/components/ui/Text';
import { TextLink } from '@/components/ui/TextLink';

export default function NotFoundScreen() {
  return (
    <AuthFrame>
      <Text variant="heading" level={1}>
        Page not found
      </Text>
      <Text variant="muted">The address may be mistyped, or the page has moved.</Text>
      <TextLink href="/">Go to the home page</TextLink>
    </AuthFrame>
  );
}
