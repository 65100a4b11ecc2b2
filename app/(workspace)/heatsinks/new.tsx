import { NewHeatsinkScreen } from '@/features/heatsinks/heatsink-edit-screen';

export default NewHeatsinkScreen;
