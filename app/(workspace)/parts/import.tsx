import { PartImportScreen } from '@/features/parts/part-import-screen';

export default PartImportScreen;
