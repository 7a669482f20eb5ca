import { lazyScreen } from '@/components/screens/routes';

export default lazyScreen('OutboxScreen');
