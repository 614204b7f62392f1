export { ResetPasswordPage as Component } from "@/features/auth/pages/reset-password-page";
