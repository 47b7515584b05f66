export { HuntScreen as default } from '@/features/hunts/hunt-screen';
