export { sendMail, flushOutbox } from "./outbox";
export * from "./templates";
