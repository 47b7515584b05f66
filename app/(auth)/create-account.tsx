export { CreateAccountScreen as default } from '@/features/auth/create-account-screen';
