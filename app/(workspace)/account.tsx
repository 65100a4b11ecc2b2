import { AccountScreen } from '@/features/account/account-screen';

export default AccountScreen;
