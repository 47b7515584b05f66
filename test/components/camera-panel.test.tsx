import { fireEvent, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { CameraPanel } from '../../src/features/camera/camera-panel.web';
import { DigitCells } from '../../src/features/sift/components/digit-cells';

function stubCamera(secure: boolean, getUserMedia?: () => Promise<MediaStream>) {
  vi.stubGlobal('isSecureContext', secure);
  Object.defineProperty(navigator, 'mediaDevices', { value: getUserMedia ? { getUserMedia } : undefined, configurable: true });
}

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('the camera panel when the camera cannot start', () => {
  it('when the page is not on a secure origin, then it says so plainly and offers the keypad', async () => {
    stubCamera(false);
    const onClose = vi.fn();
    render(<CameraPanel onVerdict={() => undefined} onClose={onClose} />);
    expect(await screen.findByText('The camera needs a secure address')).toBeTruthy();
    fireEvent.click(screen.getByLabelText('Back to the keypad'));
    expect(onClose).toHaveBeenCalledTimes(1);
  });

  it('when the hunter refuses the permission, then it says how to allow it and keeps the keypad one tap away', async () => {
    stubCamera(true, () => Promise.reject(Object.assign(new Error('denied'), { name: 'NotAllowedError' })));
    render(<CameraPanel onVerdict={() => undefined} onClose={() => undefined} />);
    expect(await screen.findByText('Camera permission was refused')).toBeTruthy();
    expect(screen.getByLabelText('Back to the keypad')).toBeTruthy();
  });

  it('when the device has no camera, then it says there is none', async () => {
    stubCamera(true, () => Promise.reject(Object.assign(new Error('none'), { name: 'NotFoundError' })));
    render(<CameraPanel onVerdict={() => undefined} onClose={() => undefined} />);
    expect(await screen.findByText('No camera found')).toBeTruthy();
  });
});

describe('digit cells with camera doubts', () => {
  it('when the camera was unsure of the 3rd and 7th digits, then the cells say which to check', () => {
    render(<DigitCells digits="12345678" prefix="MB" star={false} unsure={[3, 7]} />);
    expect(screen.getByTestId('digit-cells').getAttribute('aria-label')).toBe('Serial MB 1 2 3 4 5 6 7 8; check digit 3, 7');
  });
});
