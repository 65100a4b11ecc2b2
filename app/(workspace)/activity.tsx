import { ActivityScreen } from '@/features/activity/activity-screen';

export default ActivityScreen;
