import { renderWithProviders, screenText } from '../../utils/render';

import { fireEvent, screen, waitFor } from '@testing-library/react-native';

import { ScheduleEditor } from '@/components/schedules/schedule-editor';

import { draft, NOW_MS, station, unit } from './fixtures';

function renderEditor(values = draft([{ bandId: '20m', slots: 1, activeHoursUtc: null }]), onSubmit = jest.fn(async () => {})) {
  renderWithProviders(
    <ScheduleEditor
      station={station}
      unit={unit}
      defaultValues={values}
      submitLabel="Save schedule"
      onSubmit={onSubmit}
      bandsHref="/stations/12/bands"
      wide={false}
      nowMs={NOW_MS}
      renderPreview={() => null}
    />,
  );
  return { onSubmit };
}

const saveDisabled = () =>
  screen.getByLabelText('Save schedule').props['aria-disabled'] ??
  screen.getByLabelText('Save schedule').props.accessibilityState?.disabled;

describe('ScheduleEditor', () => {
  it('when a step holds a band without a fitting filter, shows the reason beside the step and disables Save', async () => {
    renderEditor(
      draft([
        { bandId: '20m', slots: 1, activeHoursUtc: null },
        { bandId: '10m', slots: 1, activeHoursUtc: null },
      ]),
    );

    await waitFor(() => expect(screenText()).toContain('No low-pass filter for 10 m is installed on this unit'));
    expect(saveDisabled()).toBe(true);
  });

  it('when the operator presses an unfiltered band, explains why and keeps the step on its band', async () => {
    renderEditor();

    fireEvent.press(screen.getByLabelText('Step 1: 10 m (not available)'));

    await waitFor(() => expect(screenText()).toContain('10 m cannot be used: No low-pass filter for 10 m is installed'));
    expect(screen.getByLabelText(/^Step 1: 20 m, all day/)).toBeTruthy();
    expect(saveDisabled()).toBeFalsy();
  });

  it('when the operator moves step 2 up, it becomes step 1 and is saved in that order', async () => {
    const { onSubmit } = renderEditor(
      draft([
        { bandId: '20m', slots: 2, activeHoursUtc: null },
        { bandId: '40m', slots: 1, activeHoursUtc: { fromHour: 19, toHour: 7 } },
      ]),
    );

    fireEvent.press(screen.getByLabelText('Move step 2 up'));

    await waitFor(() => expect(screen.getByLabelText(/^Step 1: 40 m, 19:00–07:00 UTC/)).toBeTruthy());
    expect(screen.getByLabelText(/^Step 2: 20 m, all day/)).toBeTruthy();
    fireEvent.press(screen.getByLabelText('Save schedule'));
    await waitFor(() => expect(onSubmit).toHaveBeenCalled());
    expect((onSubmit.mock.calls[0] as unknown[])[0]).toMatchObject({
      steps: [
        { bandId: '40m', slots: 1, activeHoursUtc: { fromHour: 19, toHour: 7 } },
        { bandId: '20m', slots: 2, activeHoursUtc: null },
      ],
    });
  });

  it('when the share of slots is above 50 %, says why and blocks the save; at 30 % it warns and allows it', async () => {
    renderEditor();

    fireEvent.changeText(screen.getByLabelText('Share of slots (%)'), '60');
    await waitFor(() => expect(screenText()).toContain('Use at most 50 %'));
    expect(saveDisabled()).toBe(true);

    fireEvent.changeText(screen.getByLabelText('Share of slots (%)'), '30');
    await waitFor(() => expect(screenText()).toContain('more than the usual one slot in five'));
    expect(saveDisabled()).toBeFalsy();
  });
});
