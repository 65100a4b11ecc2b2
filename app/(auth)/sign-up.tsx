import { SignUpScreen } from '@/features/auth/sign-up-screen';

export default SignUpScreen;
