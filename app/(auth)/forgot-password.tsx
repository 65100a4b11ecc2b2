import { ForgotPasswordScreen } from '@/features/password-reset/forgot-password-screen';

export default ForgotPasswordScreen;
