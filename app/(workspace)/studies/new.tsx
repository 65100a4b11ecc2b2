import { NewStudyScreen } from '@/features/studies/new-study-screen';

export default NewStudyScreen;
