export { SignedInArea as default } from '@/components/screens/routes';
