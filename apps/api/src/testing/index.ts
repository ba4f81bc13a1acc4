export { Client, testOrigin } from "./client.js";
export { createTestApp, testConfig, testPassword, uniqueEmail, type TestApp } from "./testApp.js";
export { createTestDatabase, adminUrl, databaseUrl, type TestDatabase } from "./testDatabase.js";
export { invalidModel, mechanismModel, twoSpanModel } from "./models.js";
export { findVerificationLink, verificationToken } from "./verificationMail.js";
