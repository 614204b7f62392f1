export { SignInPage as Component } from "@/features/auth/pages/sign-in-page";
