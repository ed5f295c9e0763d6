// An e-mail address as the server's @IsEmail() checks it: validator.js 13's isEmail with its
// default options (no display name, no IP domain, a top-level domain required), written out.

const LOCAL_PART = /^[a-z\d!#$%&'*+\-/=?^_`{|}~\u00A1-\uD7FF\uF900-\uFDCF\uFDF0-\uFFEF]+$/i;
// The quoted local part may hold control characters.
const QUOTED_LOCAL_PART =
  // eslint-disable-next-line no-control-regex
  /^([\s\x01-\x08\x0b\x0c\x0e-\x1f\x7f\x21\x23-\x5b\x5d-\x7e\u00A0-\uD7FF\uF900-\uFDCF\uFDF0-\uFFEF]|(\\[\x01-\x09\x0b\x0c\x0d-\x7f\u00A0-\uD7FF\uF900-\uFDCF\uFDF0-\uFFEF]))*$/i;
const TOP_LEVEL_DOMAIN = /^([a-z\u00A1-\u00A8\u00AA-\uD7FF\uF900-\uFDCF\uFDF0-\uFFEF]{2,}|xn[a-z0-9-]{2,})$/i;

/** Bytes in UTF-8, as validator.js counts them; text that cannot be encoded (a lone surrogate) counts as too long. */
function byteLength(text: string): number {
  try {
    return encodeURI(text).split(/%..|./).length - 1;
  } catch {
    return Infinity;
  }
}

function isDomainName(domain: string): boolean {
  const parts = domain.split('.');
  const topLevel = parts[parts.length - 1];
  if (parts.length < 2 || !TOP_LEVEL_DOMAIN.test(topLevel) || /\s/.test(topLevel)) return false;
  return parts.every(
    (part) =>
      part.length <= 63 &&
      /^[a-z_\u00a1-\uffff0-9-]+$/i.test(part) &&
      !/[\uff01-\uff5e]/.test(part) &&
      !/^-|-$/.test(part) &&
      !/_/.test(part),
  );
}

export function isEmailAddress(text: string): boolean {
  if (text.length > 254) return false;
  const parts = text.split('@');
  const domain = parts.pop() ?? '';
  let user = parts.join('@');
  if (byteLength(user) > 64 || byteLength(domain) > 254 || !isDomainName(domain)) return false;
  if (user[0] === '"' && user[user.length - 1] === '"') {
    user = user.slice(1, user.length - 1);
    return QUOTED_LOCAL_PART.test(user);
  }
  return user.split('.').every((part) => LOCAL_PART.test(part));
}
