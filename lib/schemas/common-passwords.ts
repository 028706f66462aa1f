// Passwords and password stems that head the published lists of passwords seen in breaches (common practice: the
// SecLists "most common" lists and the UK NCSC top-100k list are the usual sources; this short list is written from
// memory, not copied from them). Lower case. A new password is refused when it, or its stem with trailing digits and
// symbols removed ("Summer2026!" → "summer"), is one of these.
export const COMMON_PASSWORDS: ReadonlySet<string> = new Set([
  // keyboard and digit runs
  '1234567890', '0987654321', '12345678910', '1234567891', '123456789a', 'a123456789', '1111111111', '0000000000',
  '123123123', '123321123', '147258369', '987654321', '123456789', '12345678', '1234qwer', 'qwer1234', '1q2w3e4r',
  '1q2w3e4r5t', '1q2w3e4r5t6y', '1qaz2wsx', '1qaz2wsx3edc', 'zaq12wsx', 'zaq1zaq1', 'qazwsx', 'qazwsxedc',
  'qwerty', 'qwertyuiop', 'qwertyui', 'qwertz', 'azerty', 'asdfgh', 'asdfghjkl', 'asdf', 'zxcvbnm', 'zxcvbn',
  'qweasdzxc', '1qazxsw2', 'abc123', 'abcdef', 'abcdefg', 'abcdefgh', 'abcdefghij', 'abcd1234', 'aa123456',
  // words
  'password', 'passw0rd', 'p@ssword', 'p@ssw0rd', 'pass', 'passwort', 'motdepasse', 'contraseña', 'contrasena',
  'iloveyou', 'letmein', 'welcome', 'admin', 'administrator', 'login', 'changeme', 'secret', 'access',
  'default', 'guest', 'test', 'testing', 'demo', 'user', 'root', 'toor', 'master', 'monkey', 'dragon', 'shadow',
  'sunshine', 'princess', 'football', 'baseball', 'basketball', 'soccer', 'hockey', 'superman', 'batman',
  'starwars', 'trustno1', 'freedom', 'whatever', 'hello', 'helloworld', 'computer', 'internet', 'cheese',
  'chocolate', 'butterfly', 'purple', 'orange', 'banana', 'mustang', 'harley', 'ferrari', 'killer', 'tigger',
  'pokemon', 'naruto', 'minecraft', 'liverpool', 'chelsea', 'arsenal', 'matrix', 'samsung', 'google', 'linkedin',
  'summer', 'winter', 'spring', 'autumn', 'michael', 'jennifer', 'jordan', 'hunter', 'ranger', 'buster', 'thomas',
  'robert', 'daniel', 'andrew', 'joshua', 'jessica', 'ashley', 'charlie', 'pepper', 'ginger', 'cookie', 'flower',
  'lovely', 'loveme', 'babygirl', 'anthony', 'nicole', 'jesus', 'blessed', 'angel', 'family', 'forever', 'friends',
  // this product and its demo data
  'stepwell', 'stepwell-demo', 'kestrel', 'kestrelridge',
]);
