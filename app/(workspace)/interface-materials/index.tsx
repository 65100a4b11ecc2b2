import { InterfaceMaterialsScreen } from '@/features/interface-materials/interface-materials-screen';

export default InterfaceMaterialsScreen;
