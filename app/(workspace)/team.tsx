import { TeamScreen } from '@/features/team/team-screen';

export default TeamScreen;
