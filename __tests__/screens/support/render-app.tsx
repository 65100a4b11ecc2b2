import { Slot } from 'expo-router';
import { renderRouter } from 'expo-router/testing-library';

import { createQueryClient } from '@/api';
import { AppProviders } from '@/features/shell/app-providers';

import AuthLayout from '../../../app/(auth)/_layout';
import ForgotPasswordRoute from '../../../app/(auth)/forgot-password';
import SignInRoute from '../../../app/(auth)/sign-in';
import SignUpRoute from '../../../app/(auth)/sign-up';
import WorkspaceLayout from '../../../app/(workspace)/_layout';
import AccountRoute from '../../../app/(workspace)/account';
import ActivityRoute from '../../../app/(workspace)/activity';
import HeatsinksRoute from '../../../app/(workspace)/heatsinks';
import HeatsinkRoute from '../../../app/(workspace)/heatsinks/[id]';
import EditHeatsinkRoute from '../../../app/(workspace)/heatsinks/[id]/edit';
import HeatsinkDesignRoute from '../../../app/(workspace)/heatsinks/design';
import HeatsinkImportRoute from '../../../app/(workspace)/heatsinks/import';
import NewHeatsinkRoute from '../../../app/(workspace)/heatsinks/new';
import StudiesRoute from '../../../app/(workspace)/index';
import InterfaceMaterialsRoute from '../../../app/(workspace)/interface-materials';
import InterfaceMaterialRoute from '../../../app/(workspace)/interface-materials/[id]';
import OutboxRoute from '../../../app/(workspace)/outbox';
import PartsRoute from '../../../app/(workspace)/parts';
import PartRoute from '../../../app/(workspace)/parts/[id]';
import EditPartRoute from '../../../app/(workspace)/parts/[id]/edit';
import PartImportRoute from '../../../app/(workspace)/parts/import';
import NewPartRoute from '../../../app/(workspace)/parts/new';
import StudyRoute from '../../../app/(workspace)/studies/[id]';
import EditStudyRoute from '../../../app/(workspace)/studies/[id]/edit';
import StudyReportRoute from '../../../app/(workspace)/studies/[id]/report';
import RevisionRoute from '../../../app/(workspace)/studies/[id]/revisions/[number]';
import NewStudyRoute from '../../../app/(workspace)/studies/new';
import TeamRoute from '../../../app/(workspace)/team';
import TeamSettingsRoute from '../../../app/(workspace)/team-settings';
import InvitationRoute from '../../../app/invitations/[token]';
import ResetPasswordRoute from '../../../app/reset-password/[token]';

/**
 * Renders the real route tree from a URL. The root layout is replaced only to
 * skip font loading and to give each test a fresh query cache without retries.
 */
export function renderApp(initialUrl: string) {
  const queryClient = createQueryClient();
  queryClient.setDefaultOptions({
    queries: { ...queryClient.getDefaultOptions().queries, retry: false },
  });
  function TestRootLayout() {
    return (
      <AppProviders queryClient={queryClient}>
        <Slot />
      </AppProviders>
    );
  }
  return renderRouter(
    {
      _layout: TestRootLayout,
      '(auth)/_layout': AuthLayout,
      '(auth)/sign-in': SignInRoute,
      '(auth)/sign-up': SignUpRoute,
      '(auth)/forgot-password': ForgotPasswordRoute,
      '(workspace)/_layout': WorkspaceLayout,
      '(workspace)/index': StudiesRoute,
      '(workspace)/account': AccountRoute,
      '(workspace)/studies/new': NewStudyRoute,
      '(workspace)/studies/[id]': StudyRoute,
      '(workspace)/studies/[id]/edit': EditStudyRoute,
      '(workspace)/studies/[id]/report': StudyReportRoute,
      '(workspace)/studies/[id]/revisions/[number]': RevisionRoute,
      '(workspace)/team': TeamRoute,
      '(workspace)/team-settings': TeamSettingsRoute,
      '(workspace)/outbox': OutboxRoute,
      '(workspace)/activity': ActivityRoute,
      '(workspace)/heatsinks/index': HeatsinksRoute,
      '(workspace)/heatsinks/new': NewHeatsinkRoute,
      '(workspace)/heatsinks/import': HeatsinkImportRoute,
      '(workspace)/heatsinks/design': HeatsinkDesignRoute,
      '(workspace)/heatsinks/[id]/index': HeatsinkRoute,
      '(workspace)/heatsinks/[id]/edit': EditHeatsinkRoute,
      '(workspace)/parts/index': PartsRoute,
      '(workspace)/parts/new': NewPartRoute,
      '(workspace)/parts/import': PartImportRoute,
      '(workspace)/parts/[id]/index': PartRoute,
      '(workspace)/parts/[id]/edit': EditPartRoute,
      '(workspace)/interface-materials/index': InterfaceMaterialsRoute,
      '(workspace)/interface-materials/[id]/index': InterfaceMaterialRoute,
      'invitations/[token]': InvitationRoute,
      'reset-password/[token]': ResetPasswordRoute,
    },
    { initialUrl },
  );
}
