export { VerifyPage } from "./pages/verify-page";
