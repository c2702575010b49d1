import type { Html5Qrcode } from 'html5-qrcode';
import { useEffect, useEffectEvent, useId, useRef, useState } from 'react';
import { Icon } from '@/components/ui/icon';
import type { readQr as ReadQr } from '../utils/frame-reader';

type CameraStatus = 'starting' | 'running' | 'unavailable';

// The same badge stays in front of the camera for many frames; one read per second is enough.
const SAME_CODE_QUIET_MS = 3_000;
const SECOND_READER_EVERY_MS = 400;

/**
 * The camera preview inside the badge outline, reading QR codes with html5-qrcode and, on the
 * same video, jsQR. The whole frame is scanned (no qrbox), so a badge held anywhere in view is
 * read, whatever its size.
 */
export function BadgeCamera({
  onCode,
  unavailableText = 'No camera here, or it is not allowed. Use a badge scanner or type the badge code.',
}: {
  onCode: (code: string) => void;
  /** What to do instead when there is no camera: the crib's tags are typed as tags, not badge codes. */
  unavailableText?: string;
}) {
  const elementId = `badge-camera-${useId().replace(/[^A-Za-z0-9_-]/g, '')}`;
  const [status, setStatus] = useState<CameraStatus>('starting');
  // Starting and stopping a camera take time; each waits for the one before, so React's
  // StrictMode (mount, unmount, mount) never has two scanners on the same element.
  const queue = useRef<Promise<void>>(Promise.resolve());
  const emit = useEffectEvent(onCode);

  useEffect(() => {
    let cancelled = false;
    let scanner: Html5Qrcode | undefined;
    let secondReader: ReturnType<typeof setInterval> | undefined;
    let last = { code: '', at: 0 };
    const found = (text: string) => {
      const now = Date.now();
      if (text === last.code && now - last.at < SAME_CODE_QUIET_MS) return;
      last = { code: text, at: now };
      emit(text);
    };
    // Reads the video html5-qrcode shows, for the codes its own decoder misses.
    const canvas = document.createElement('canvas');
    const readFrame = (readQr: typeof ReadQr, readWidth: number) => {
      const video = document.getElementById(elementId)?.querySelector('video');
      if (!video || video.readyState < HTMLMediaElement.HAVE_CURRENT_DATA || !video.videoWidth) return;
      const scale = Math.min(1, readWidth / video.videoWidth);
      canvas.width = Math.round(video.videoWidth * scale);
      canvas.height = Math.round(video.videoHeight * scale);
      const context = canvas.getContext('2d', { willReadFrequently: true });
      if (!context) return;
      context.drawImage(video, 0, 0, canvas.width, canvas.height);
      const text = readQr(context.getImageData(0, 0, canvas.width, canvas.height).data, canvas.width, canvas.height);
      if (text) found(text);
    };

    queue.current = queue.current.then(async () => {
      if (cancelled) return;
      if (!navigator.mediaDevices?.getUserMedia) {
        setStatus('unavailable');
        return;
      }
      try {
        // The readers load after the screen shows: the idle screen need not wait for them.
        const [{ Html5Qrcode, Html5QrcodeSupportedFormats }, { readQr, READ_WIDTH }] = await Promise.all([
          import('html5-qrcode'),
          import('../utils/frame-reader'),
        ]);
        if (cancelled) return;
        const instance = new Html5Qrcode(elementId, { verbose: false, formatsToSupport: [Html5QrcodeSupportedFormats.QR_CODE] });
        await instance.start(
          // The station's camera faces the person standing at it.
          { facingMode: 'user' },
          { fps: 10 },
          found,
          () => undefined,
        );
        scanner = instance;
        if (cancelled) return;
        secondReader = setInterval(() => readFrame(readQr, READ_WIDTH), SECOND_READER_EVERY_MS);
        setStatus('running');
      } catch {
        // No camera, the browser was not allowed to use it, or the reader did not load: the
        // other ways still work.
        if (!cancelled) setStatus('unavailable');
      }
    });

    return () => {
      cancelled = true;
      clearInterval(secondReader);
      queue.current = queue.current.then(async () => {
        if (!scanner) return;
        try {
          if (scanner.isScanning) await scanner.stop();
          scanner.clear();
        } catch {
          // The element may already be gone with its screen; nothing is left running either way.
        }
      });
    };
  }, [elementId]);

  return (
    <div className="relative flex h-full w-full items-center justify-center overflow-hidden rounded-xl bg-black/40">
      {/* html5-qrcode sizes the video itself and maps it to its canvas by that size: restyling
          the video would stretch what is decoded, so the outline only crops it. */}
      <div id={elementId} className="w-full" />
      {status !== 'running' ? (
        <p role="status" className="absolute inset-0 flex items-center justify-center gap-4 px-6 text-center text-kiosk-body">
          {status === 'starting' ? (
            <>
              <Icon name="hourglass" className="size-9" />
              <span>Starting the camera…</span>
            </>
          ) : (
            <>
              <Icon name="camera-off" className="size-9" />
              <span>{unavailableText}</span>
            </>
          )}
        </p>
      ) : null}
    </div>
  );
}
