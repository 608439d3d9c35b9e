export interface BinCodeProps {
  code: string;
}

/**
 * A stock bin's code ("C-02-1") as one unbreakable piece: a narrow column wraps before or after it (between the store
 * and the bin), never at a hyphen inside it. The text stays as typed, so it copies and searches as the shelf label reads.
 */
export function BinCode({ code }: BinCodeProps) {
  return (
    <span className="bin-code" style={{ whiteSpace: 'nowrap' }}>
      {code}
    </span>
  );
}
