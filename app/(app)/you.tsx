export { YouScreen as default } from '@/features/you/you-screen';
