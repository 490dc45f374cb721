/** An e-mail address that breaks at its @, not mid-word: the name on one line, the domain under it. */
export function EmailAddress({ address }: { address: string }) {
  const at = address.indexOf("@");
  if (at <= 0) return <span className="break-all">{address}</span>;
  return (
    <span title={address}>
      {address.slice(0, at)}
      <span className="block text-ink-soft">{address.slice(at)}</span>
    </span>
  );
}
