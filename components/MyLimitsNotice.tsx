import { useMeQuery } from '../hooks/auth';
import { useMyLimitsQuery } from '../hooks/reports';
import { NewAccountLimitsNotice, type LimitFocus } from './NewAccountLimitsNotice';

export type MyLimitsNoticeProps = { focus: LimitFocus };

/**
 * The new-account limits for whoever is signed in, loaded here so any form can place it with one
 * line. A failed check shows nothing: the server still explains any refusal when a post is sent.
 */
export function MyLimitsNotice({ focus }: MyLimitsNoticeProps) {
  const me = useMeQuery();
  const limits = useMyLimitsQuery(Boolean(me.data));
  if (!limits.data) return null;
  return <NewAccountLimitsNotice limits={limits.data} focus={focus} />;
}
