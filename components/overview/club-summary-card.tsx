import { StyleSheet, View } from 'react-native';

import type { ClubMembership } from '@/shared/api/contracts';

import { useClubQuery, useReviewQuery } from '../clubs/queries';
import { useClubHealthQuery } from '../health/queries';
import { Card } from '../ui/card';
import { Heading } from '../ui/heading';
import { Text } from '../ui/text';
import { TextLink } from '../ui/text-link';
import { fonts, space } from '../ui/theme';

/** An admin's club at a glance on the overview: members, stations on the air, open findings and open alerts, each linking on. */
export function ClubSummaryCard({ club }: { club: ClubMembership }) {
  const detail = useClubQuery(club.clubId);
  const review = useReviewQuery(club.clubId);
  const health = useClubHealthQuery(club.clubId);
  const rows = review.data ?? [];
  const onAir = rows.filter((r) => r.transmitEnabled && !r.suspension).length;
  const findings = rows.reduce((n, r) => n + r.findings.length, 0);
  const alerts = (health.data ?? []).reduce((n, s) => n + s.alerts.filter((a) => a.resolvedAt === null).length, 0);
  const figure = (ready: boolean, failed: boolean, value: number) => (failed ? '—' : ready ? String(value) : '…');
  const id = String(club.clubId);
  return (
    <Card>
      <Heading level={2}>{`${club.clubName}: club summary`}</Heading>
      <View style={styles.figures}>
        <Figure label="members" value={figure(!!detail.data, detail.isError, detail.data?.members.length ?? 0)} />
        <Figure label="stations on the air" value={figure(!!review.data, review.isError, onAir)} />
        <Figure label="open findings" value={figure(!!review.data, review.isError, findings)} />
        <Figure label="open alerts" value={figure(!!health.data, health.isError, alerts)} />
      </View>
      <View style={styles.links}>
        <TextLink href={{ pathname: '/club/[clubId]', params: { clubId: id } }} label="Members" />
        <TextLink href={{ pathname: '/club/[clubId]/review', params: { clubId: id } }} label="Review findings" />
        <TextLink href={{ pathname: '/club/health', params: { clubId: id } }} label="Beacon health and alerts" />
      </View>
    </Card>
  );
}

function Figure({ label, value }: { label: string; value: string }) {
  return (
    <View style={styles.figure} accessible accessibilityLabel={`${value} ${label}`}>
      <Text variant="title" tone="primary" style={styles.number}>
        {value}
      </Text>
      <Text variant="caption" tone="muted">
        {label}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  figures: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  figure: { minWidth: 110 },
  number: { fontFamily: fonts.monoMedium },
  links: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg },
});
