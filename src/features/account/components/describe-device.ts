/** A short, honest reading of a User-Agent: browser and system when recognisable, else the raw text. */
export function describeDevice(userAgent: string | null): string {
  if (!userAgent) return 'Unknown device';
  const browser =
    /Edg\//.test(userAgent) ? 'Edge'
    : /OPR\//.test(userAgent) ? 'Opera'
    : /Firefox\//.test(userAgent) ? 'Firefox'
    : /Chrome\/|Chromium\//.test(userAgent) ? 'Chromium-based browser'
    : /Safari\//.test(userAgent) ? 'Safari'
    : /curl|node|undici|python|Go-http/i.test(userAgent) ? 'Program'
    : null;
  const system =
    /Windows/.test(userAgent) ? 'Windows'
    : /Android/.test(userAgent) ? 'Android'
    : /iPhone|iPad|iOS/.test(userAgent) ? 'iOS'
    : /Mac OS X|Macintosh/.test(userAgent) ? 'macOS'
    : /Linux/.test(userAgent) ? 'Linux'
    : null;
  if (!browser && !system) return userAgent.length > 60 ? `${userAgent.slice(0, 57)}…` : userAgent;
  return [browser ?? 'Browser', system].filter(Boolean).join(' on ');
}
