export {
  startMailCatcher,
  MailCatcherError,
  type MailCatcher,
  type MailCatcherErrorCode,
  type MailCatcherOptions,
  type CaughtMessage,
  type CaughtAttachment,
} from "./mailCatcher.js";
