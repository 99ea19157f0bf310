/**
 * A small list of passwords that appear at the top of every published list of
 * breached passwords (from memory of such lists; no single source). Checked
 * case-insensitively, after the length rule, so only entries of 12+ characters
 * matter here, plus variants a chocolate business might reach for.
 */
export const commonPasswords: ReadonlySet<string> = new Set([
  "123456789012",
  "1234567890123",
  "12345678901234",
  "123456123456",
  "qwertyuiopas",
  "qwerty123456",
  "1q2w3e4r5t6y",
  "password1234",
  "password12345",
  "passwordpassword",
  "password123456",
  "iloveyou1234",
  "letmein12345",
  "welcome12345",
  "welcome123456",
  "administrator",
  "admin1234567",
  "abc123456789",
  "aaaaaaaaaaaa",
  "111111111111",
  "000000000000",
  "qazwsxedcrfv",
  "trustno1trustno1",
  "football1234",
  "baseball1234",
  "sunshine1234",
  "princess1234",
  "chocolate123",
  "chocolate1234",
  "chocolatechocolate",
  "ilovechocolate",
  "darkchocolate",
  "milkchocolate",
  "cocoabutter1",
  "changeme1234",
  "barwright123",
  "barwright1234",
]);

export const MIN_PASSWORD_LENGTH = 12;
export const MAX_PASSWORD_LENGTH = 256;
