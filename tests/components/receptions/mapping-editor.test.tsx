import { jsonResponse, renderWithProviders, screenText, stubFetch } from '../../utils/render';

import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { useEffect } from 'react';
import { View } from 'react-native';

import { MappingEditor } from '@/components/imports/mapping-editor';
import { usePreviewImportMutation } from '@/components/imports/queries';
import type { ImportMapping, ImportPreview } from '@/shared/api/receptions';

const mapping: ImportMapping = {
  delimiter: '\t',
  hasHeader: true,
  columns: [
    { index: 0, header: 'when', role: 'time' },
    { index: 1, header: 'heard_by', role: 'rxCallsign' },
    { index: 2, header: 'snr', role: 'snrDb' },
    { index: 3, header: 'mhz', role: 'frequency' },
  ],
  timeFormat: 'iso',
  frequencyUnit: 'hz',
};
const samples: ImportPreview['rows'] = [
  { rowNumber: 2, cells: ['1764669840', 'Q2ROB', '-17', '14.097102'], report: null, problem: 'when is not an ISO 8601 time' },
];

describe('column mapping correction', () => {
  it("when the operator changes a column's role, hands back the mapping with only that column changed", () => {
    const onChange = jest.fn();
    renderWithProviders(<MappingEditor mapping={mapping} samples={samples} onChange={onChange} />);
    expect(screenText()).toContain('Fields separated by tabs; the first line names the columns');
    expect(screenText()).toContain('14.097102');
    fireEvent.press(screen.getByLabelText('Change what “snr” holds'));
    fireEvent.press(screen.getByLabelText('Drift (Hz)'));
    expect(onChange).toHaveBeenLastCalledWith({
      ...mapping,
      columns: mapping.columns.map((c) => (c.index === 2 ? { ...c, role: 'driftHz' } : c)),
    });
  });

  it('when the operator corrects the time format and the frequency unit, hands both back', () => {
    const onChange = jest.fn();
    renderWithProviders(<MappingEditor mapping={mapping} samples={samples} onChange={onChange} />);
    fireEvent.press(screen.getByLabelText('Seconds since 1970'));
    expect(onChange).toHaveBeenLastCalledWith({ ...mapping, timeFormat: 'epoch-seconds' });
    fireEvent.press(screen.getByLabelText('MHz'));
    expect(onChange).toHaveBeenLastCalledWith({ ...mapping, frequencyUnit: 'mhz' });
  });
});

function PreviewProbe({ file, next, onDone }: { file: File; next: ImportMapping; onDone: (p: ImportPreview) => void }) {
  const preview = usePreviewImportMutation();
  useEffect(() => {
    preview.mutate({ file, mapping: next }, { onSuccess: onDone });
    // once, on mount
    // eslint-disable-next-line react-hooks/exhaustive-deps -- the probe fires a single request
  }, []);
  return <View accessibilityLabel="probe" />;
}

describe('reading the file again with a corrected mapping', () => {
  it('sends the mapping field before the file, as a multipart body through the typed client', async () => {
    const corrected: ImportMapping = { ...mapping, timeFormat: 'epoch-seconds', frequencyUnit: 'mhz' };
    const answer: ImportPreview = { mapping: corrected, rows: [], notes: [] };
    const { fetchMock } = stubFetch(() => jsonResponse(200, answer));
    const onDone = jest.fn();
    const file = new File(['when\theard_by\tsnr\tmhz\n1764669840\tQ2ROB\t-17\t14.097102\n'], 'decodes.tsv', {
      type: 'text/tab-separated-values',
    });
    renderWithProviders(<PreviewProbe file={file} next={corrected} onDone={onDone} />);
    await waitFor(() => expect(onDone).toHaveBeenCalledWith(answer, expect.anything(), undefined, expect.anything()));
    const [url, init] = fetchMock.mock.calls[0] as [string, { method: string; body: FormData }];
    expect(url).toBe('/api/reception-imports/preview');
    expect(init.method).toBe('POST');
    expect([...init.body.keys()]).toEqual(['mapping', 'file']);
    expect(JSON.parse(String(init.body.get('mapping')))).toEqual(corrected);
  });
});
