export { OutboxPage as Component } from "@/features/outbox/pages/outbox-page";
