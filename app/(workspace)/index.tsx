import { StudiesScreen } from '@/features/studies/studies-screen';

export default StudiesScreen;
