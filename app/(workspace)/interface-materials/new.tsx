import { NewInterfaceMaterialScreen } from '@/features/interface-materials/interface-edit-screen';

export default NewInterfaceMaterialScreen;
