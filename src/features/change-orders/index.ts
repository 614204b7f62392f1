/** The change-orders feature's public face: the staff panel (composed into the proposal page) and the homeowner's page. */
export { ChangeOrdersPanel, type ChangeOrdersPanelProps } from "./components/change-orders-panel";
export { ChangeOrderPage } from "./pages/change-order-page";
