import { NewPartScreen } from '@/features/parts/part-edit-screen';

export default NewPartScreen;
