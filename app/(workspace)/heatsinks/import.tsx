import { HeatsinkImportScreen } from '@/features/heatsinks/heatsink-import-screen';

export default HeatsinkImportScreen;
