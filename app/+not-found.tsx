import { AuthFrame } from '@/components/auth/AuthFrame';
import { Text, TextLink } from '@/components/ui';

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
