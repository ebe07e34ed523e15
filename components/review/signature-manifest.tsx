import { SIGNATURE_MEANING_LABELS, type SignatureMeaning } from "@/lib/contract/vocabulary";

export interface ManifestSignature {
  revision: number;
  signerName: string;
  meaning: string;
  comment: string;
  signedAt: string;
  contentHash: string;
  valid?: boolean;
}

const utc = (iso: string) => `${iso.slice(0, 10)} ${iso.slice(11, 19)} UTC`;

/** Who signed which revision, meaning what, when (server clock) and over which content hash. */
export function SignatureManifest({ signatures }: { signatures: ManifestSignature[] }) {
  if (signatures.length === 0) return null;
  return (
    <section aria-labelledby="manifest-heading" className="space-y-2 card p-4 text-sm">
      <h2 id="manifest-heading" className="font-semibold">
        Signature manifest
      </h2>
      <ul className="space-y-3">
        {signatures.map((s) => (
          <li key={`${s.revision}-${s.signedAt}`} className="space-y-0.5" data-testid="signature">
            <p>
              <span className="font-medium">{s.signerName}</span> countersigned revision{" "}
              {s.revision}
              {s.valid === false ? (
                <span className="ml-2 chip bg-red-50 text-red-800">does not verify</span>
              ) : s.valid ? (
                <span className="ml-2 chip bg-lagoon-50 text-lagoon-700">verifies</span>
              ) : null}
            </p>
            <p className="text-ink-soft">
              {SIGNATURE_MEANING_LABELS[s.meaning as SignatureMeaning] ?? s.meaning}
            </p>
            {s.comment ? <p className="text-ink-soft italic">“{s.comment}”</p> : null}
            <p className="font-mono text-xs break-all text-ink-faint">
              {utc(s.signedAt)} · sha256 {s.contentHash}
            </p>
          </li>
        ))}
      </ul>
    </section>
  );
}
