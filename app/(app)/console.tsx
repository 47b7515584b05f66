export { ConsoleScreen as default } from '@/features/console/console-screen';
