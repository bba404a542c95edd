// Outgoing mail: nodemailer over SMTP, to SMTP_URL or to the local SMTP server (the mailroom).
export { ensureLocalSmtpServer, mailFrom, sendMail, stopLocalSmtpServer, usesExternalSmtp, type OutgoingMail } from "./send";
export { sendEditionPublishedMail, sendInvitationMail, sendRemarkMail, sendReviewRequestMail } from "./notifications";
export { mailroomEnabled } from "./mailroom";
