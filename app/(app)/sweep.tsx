export { SweepScreen as default } from '@/features/sweep/sweep-screen';
