import { InterfaceImportScreen } from '@/features/interface-materials/interface-import-screen';

export default InterfaceImportScreen;
