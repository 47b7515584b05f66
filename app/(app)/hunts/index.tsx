export { HuntsScreen as default } from '@/features/hunts/hunts-screen';
