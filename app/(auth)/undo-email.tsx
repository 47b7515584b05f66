export { UndoEmailScreen as default } from '@/features/auth/undo-email-screen';
