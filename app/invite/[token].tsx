export { InviteScreen as default } from '@/features/invites/invite-screen';
