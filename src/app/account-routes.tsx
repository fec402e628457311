import type { RouteObject } from 'react-router-dom';
import { capabilitySchema } from '../../shared/api/auth';
import { RequireAccess } from './require-access';
import { canSeeOrganisation } from './role-nav';
import { AcceptInvitationRoute } from './routes/accept-invitation';
import { AccountRoute } from './routes/account';
import { CheckEmailRoute } from './routes/check-email';
import { ForgotPasswordRoute } from './routes/forgot-password';
import { OrganisationRoute } from './routes/organisation';
import { ResetPasswordRoute } from './routes/reset-password';
import { SignInRoute } from './routes/sign-in';
import { SignUpRoute } from './routes/sign-up';
import { SupplierHomeRoute } from './routes/supplier-home';
import { VerifyEmailRoute } from './routes/verify-email';
import { WorkbenchRoute } from './routes/workbench';

const cap = capabilitySchema.enum;
const admin = (name: 'AdminLayoutRoute' | 'AdminUsersRoute' | 'AdminOrganisationsRoute' | 'AdminApiKeysRoute' | 'AdminAuditRoute' | 'AdminMailRoute') => () =>
  import('./routes/admin').then((m) => ({ Component: m[name] }));

/** Sign-in, accounts, organisations and administration; the guards only hide, the server decides. */
export const accountRoutes: RouteObject[] = [
  { path: 'sign-up', element: <SignUpRoute /> },
  { path: 'sign-up/check-email', element: <CheckEmailRoute /> },
  { path: 'verify-email', element: <VerifyEmailRoute /> },
  { path: 'sign-in', element: <SignInRoute /> },
  { path: 'forgot-password', element: <ForgotPasswordRoute /> },
  { path: 'reset-password', element: <ResetPasswordRoute /> },
  { path: 'invitations/accept', element: <AcceptInvitationRoute /> },
  {
    element: <RequireAccess />,
    children: [{ path: 'account', element: <AccountRoute /> }],
  },
  {
    element: <RequireAccess allow={canSeeOrganisation} what="My organisation is for members of a supplier or engineering organisation." />,
    children: [{ path: 'organisation', element: <OrganisationRoute /> }],
  },
  {
    element: <RequireAccess allow={(me) => me.capabilities.includes(cap['templates:author'])} what="The workbench is for engineers who author templates." />,
    children: [{ path: 'workbench', element: <WorkbenchRoute /> }],
  },
  {
    element: <RequireAccess allow={(me) => me.capabilities.includes(cap['embeds:manage'])} what="The supplier start page is for members of a supplier organisation." />,
    children: [{ path: 'supplier', element: <SupplierHomeRoute /> }],
  },
  {
    path: 'admin',
    element: <RequireAccess allow={(me) => me.capabilities.includes(cap.admin)} what="The administration pages are for administrators." />,
    children: [
      {
        lazy: admin('AdminLayoutRoute'),
        children: [
          { index: true, lazy: admin('AdminUsersRoute') },
          { path: 'organisations', lazy: admin('AdminOrganisationsRoute') },
          { path: 'api-keys', lazy: admin('AdminApiKeysRoute') },
          { path: 'audit', lazy: admin('AdminAuditRoute') },
          { path: 'mail', lazy: admin('AdminMailRoute') },
        ],
      },
    ],
  },
];
