import { HeatsinksScreen } from '@/features/heatsinks/heatsinks-screen';

export default HeatsinksScreen;
