export { TallyScreen as default } from '@/features/tally/tally-screen';
