export { KeeperScreen as default } from '@/features/keepers/keeper-screen';
