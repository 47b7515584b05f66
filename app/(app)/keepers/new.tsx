export { KeeperNewScreen as default } from '@/features/keepers/keeper-new-screen';
