export { ForgotPasswordPage as Component } from "@/features/auth/pages/forgot-password-page";
