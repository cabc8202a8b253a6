export { sendMail, flushOutbox, retryDelayS, MAX_ATTEMPTS } from "./outbox";
export { mailTransport } from "./transport";
export * from "./templates";
