import { Navigate, type RouteObject } from 'react-router-dom';
import { AppLayout } from './routes/AppLayout';
import { CountersignQueueRoute } from './routes/CountersignQueueRoute';
import { InviteRoute } from './routes/InviteRoute';
import { MailRoute } from './routes/MailRoute';
import { NotebookMembersRoute } from './routes/NotebookMembersRoute';
import { NotebookRoute } from './routes/NotebookRoute';
import { NotebooksRoute } from './routes/NotebooksRoute';
import { NotFoundRoute } from './routes/NotFoundRoute';
import { PageRoute } from './routes/PageRoute';
import { PeopleRoute } from './routes/PeopleRoute';
import { PrintRecordRoute } from './routes/PrintRecordRoute';
import { ResetConfirmRoute } from './routes/ResetConfirmRoute';
import { ResetRequestRoute } from './routes/ResetRequestRoute';
import { SignInRoute } from './routes/SignInRoute';

/** Every screen of the client. Screens before sign-in stand alone; the rest share AppLayout. */
export const routes: RouteObject[] = [
  { path: '/sign-in', element: <SignInRoute /> },
  { path: '/invite/:token', element: <InviteRoute /> },
  { path: '/reset', element: <ResetRequestRoute /> },
  { path: '/reset/:token', element: <ResetConfirmRoute /> },
  {
    element: <AppLayout />,
    children: [
      { index: true, element: <Navigate to="/notebooks" replace /> },
      { path: '/notebooks', element: <NotebooksRoute /> },
      { path: '/notebooks/:notebookId', element: <NotebookRoute /> },
      { path: '/notebooks/:notebookId/members', element: <NotebookMembersRoute /> },
      { path: '/pages/:pageId', element: <PageRoute /> },
      { path: '/pages/:pageId/print', element: <PrintRecordRoute /> },
      { path: '/countersign', element: <CountersignQueueRoute /> },
      { path: '/people', element: <PeopleRoute /> },
      { path: '/mail', element: <MailRoute /> },
      { path: '/mail/:mailId', element: <MailRoute /> },
      { path: '*', element: <NotFoundRoute /> },
    ],
  },
];
