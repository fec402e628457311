import type { ApiKeyInfo } from '../../../../shared/api/v1';

/**
 * A first call for a new key, as docs/api.md writes it: the endpoint its scopes reach first
 * (solve, then the template list, sweep, sensitivity, spec validation); a publishable key also
 * sends one of its origins, since it is refused without one.
 */
export function curlExample(base: string, key: string, info: Pick<ApiKeyInfo, 'kind' | 'scopes' | 'allowedOrigins'>): string {
  const origin = info.kind === 'publishable' && info.allowedOrigins[0] ? ` -H "Origin: ${info.allowedOrigins[0]}"` : '';
  const auth = `-H "Authorization: Bearer ${key}"${origin}`;
  const json = `${auth} -H "Content-Type: application/json"`;
  const api = `${base.replace(/\/$/, '')}/api/v1`;
  const has = (scope: ApiKeyInfo['scopes'][number]) => info.scopes.includes(scope);
  if (has('solve'))
    return `curl -s "${api}/templates/wall-jib-tie-rod/solve" \\\n  ${json} \\\n  -d '{"version":"^1.0.0","inputs":{"L":4000,"h":1500},"units":"SI"}'`;
  if (has('read')) return `curl -s "${api}/templates" \\\n  ${auth}`;
  if (has('sweep'))
    return `curl -s "${api}/templates/wall-jib-tie-rod/sweep" \\\n  ${json} \\\n  -d '{"inputs":{},"sweep":{"input":"L","from":2000,"to":6000,"steps":5}}'`;
  if (has('sensitivity'))
    return `curl -s "${api}/templates/wall-jib-tie-rod/sensitivity" \\\n  ${json} \\\n  -d '{"inputs":{},"tornado":{"result":"T","percent":10}}'`;
  return `curl -s "${api}/specs/validate" \\\n  ${json} \\\n  -d "{\\"spec\\": $(cat my-clamp.spec.json)}"`;
}
