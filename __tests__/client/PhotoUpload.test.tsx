import { screen } from '@testing-library/react-native';
import { PhotoUploader } from '../../components/PhotoUploader';
import { PhotoUploadProgress } from '../../components/PhotoUploadProgress';
import { renderThemed } from './support/render';

describe('PhotoUploadProgress', () => {
  it('reports the share sent as a progress bar value and in words', () => {
    renderThemed(<PhotoUploadProgress fraction={0.42} />);
    const bar = screen.getByRole('progressbar', { name: 'Photo upload' });
    expect(bar).toHaveAccessibilityValue({ min: 0, max: 100, now: 42 });
    expect(screen.getByText('Uploading the photo… 42%')).toBeTruthy();
  });

  it('says the server is working on the photo once every byte is sent', () => {
    renderThemed(<PhotoUploadProgress fraction={1} />);
    expect(screen.getByRole('progressbar')).toHaveAccessibilityValue({ now: 100 });
    expect(screen.getByText('Sent; Tunefork is checking and resizing it…')).toBeTruthy();
  });

  it('keeps the value between 0 and 100 whatever it is given', () => {
    renderThemed(<PhotoUploadProgress fraction={1.7} />);
    expect(screen.getByRole('progressbar')).toHaveAccessibilityValue({ now: 100 });
  });
});

describe('PhotoUploader', () => {
  it('shows the progress bar only while an upload is out', () => {
    const { rerender } = renderThemed(<PhotoUploader onPick={() => {}} progress={null} error={null} done={false} />);
    expect(screen.queryByRole('progressbar')).toBeNull();
    rerender(<PhotoUploader onPick={() => {}} progress={0.25} error={null} done={false} />);
    expect(screen.getByRole('progressbar')).toHaveAccessibilityValue({ now: 25 });
  });

  it('shows the server’s reason when a photo is refused', () => {
    renderThemed(
      <PhotoUploader onPick={() => {}} progress={null} error="That photo is larger than the 12 MB limit. Export it smaller and try again." done={false} />,
    );
    expect(screen.getByRole('alert')).toHaveTextContent('That photo is larger than the 12 MB limit. Export it smaller and try again.');
  });
});
