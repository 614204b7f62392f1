export { AcceptInvitePage as Component } from "@/features/auth/pages/accept-invite-page";
