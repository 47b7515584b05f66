export { KeepersScreen as default } from '@/features/keepers/keepers-screen';
