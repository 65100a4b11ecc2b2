import { TeamSettingsScreen } from '@/features/team/team-settings-screen';

export default TeamSettingsScreen;
