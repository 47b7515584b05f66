export { NotFoundScreen as default } from '@/features/not-found/not-found-screen';
