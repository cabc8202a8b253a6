export { outboxMessage } from "./outbox";
export * from "./templates";
