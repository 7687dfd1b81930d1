import { useEffect, useState } from 'react';

// The camera's stream appears a moment after the view mounts; look for it for this long.
const LOOK_FOR_MS = 10_000;
const LOOK_EVERY_MS = 250;

interface TorchCapabilities extends MediaTrackCapabilities {
  torch?: boolean;
}

/**
 * Whether the scanner's video track offers the `torch` constraint (MediaStreamTrack.getCapabilities, Media Capture
 * Image Capture spec). Most phone rear cameras in Chromium do; laptops and desktop webcams don't, so the switch hides.
 */
export function useTorchSupport(testID = 'scan-camera'): boolean {
  const [supported, setSupported] = useState(false);
  useEffect(() => {
    const started = Date.now();
    const timer = setInterval(() => {
      const video = document.querySelector<HTMLVideoElement>(`[data-testid="${testID}"] video`);
      const track = (video?.srcObject as MediaStream | null)?.getVideoTracks?.()[0];
      if (track && track.readyState === 'live') {
        setSupported(!!(track.getCapabilities?.() as TorchCapabilities | undefined)?.torch);
        clearInterval(timer);
      } else if (Date.now() - started > LOOK_FOR_MS) clearInterval(timer);
    }, LOOK_EVERY_MS);
    return () => clearInterval(timer);
  }, [testID]);
  return supported;
}
