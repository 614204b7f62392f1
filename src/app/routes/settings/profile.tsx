export { ProfilePage as Component } from "@/features/auth/pages/profile-page";
