import { Button } from 'antd';
import { useRef, type ReactNode } from 'react';

export function CameraIcon() {
  return (
    <svg width={18} height={18} viewBox="0 0 24 24" aria-hidden="true" style={{ verticalAlign: '-3px' }} fill="none" stroke="currentColor" strokeWidth={2}>
      <path d="M4 8h3l2-3h6l2 3h3v11H4z" />
      <circle cx={12} cy={13} r={3.5} />
    </svg>
  );
}

export type CameraButtonProps = {
  /** The hidden file box's label (what the photos are of). */
  label: string;
  onFiles: (files: File[]) => void;
  children: ReactNode;
  size?: 'large' | 'middle';
  /** Full width at a finger-sized height (a narrow tile on a phone). */
  block?: boolean;
};

/** The hidden file box behind a camera button: on a phone `capture` opens the rear camera. */
export function CameraButton({ label, onFiles, children, size = 'large', block = false }: CameraButtonProps) {
  const input = useRef<HTMLInputElement>(null);
  return (
    <>
      <input
        ref={input}
        type="file"
        accept="image/*"
        capture="environment"
        multiple
        aria-label={label}
        style={{ display: 'none' }}
        onChange={(e) => {
          const files = Array.from(e.target.files ?? []);
          e.target.value = '';
          if (files.length > 0) onFiles(files);
        }}
      />
      <Button size={block ? 'middle' : size} block={block} style={block ? { height: 40 } : undefined} onClick={() => input.current?.click()}>
        {children}
      </Button>
    </>
  );
}
