export { SiftScreen as default } from '@/features/sift/sift-screen';
