export { OddsScreen as default } from '@/features/odds/odds-screen';
