/**
 * A short list of passwords long enough to pass the length rule but common in breach lists
 * (NIST SP 800-63B-4 asks verifiers to refuse common and breached passwords). Compared lower-cased.
 */
export const COMMON_PASSWORDS = new Set([
  '123456789012345', '1234567890123456', '12345678901234567890', 'qwertyuiopasdfg', 'qwertyuiopasdfghjkl',
  'passwordpassword', 'password1234567', 'password12345678', 'passwordpassword1', 'iloveyouiloveyou',
  'aaaaaaaaaaaaaaa', '111111111111111', '000000000000000', 'abcdefghijklmno', 'abc123abc123abc',
  'letmeinletmein1', 'welcomewelcome1', 'correcthorsebatterystaple', 'qazwsxedcrfvtgb', '1q2w3e4r5t6y7u8i',
  'trustno1trustno1', 'football1234567', 'baseball1234567', 'monkeymonkey123', 'dragondragon123',
  'sunshinesunshine', 'princessprincess', 'administrator123', 'changemechangeme', 'cardwrightcardwright',
]);
