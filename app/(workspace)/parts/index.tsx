import { PartsScreen } from '@/features/parts/parts-screen';

export default PartsScreen;
