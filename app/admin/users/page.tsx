import { requirePageUser } from '@/lib/auth/guard';
import { listUsers } from '@/lib/users/user-queries';
import { AddUserForm } from './add-user-form';
import { UserRow } from './user-row';
import { TableScroll } from '@/app/_components/table-scroll';

export const metadata = { title: 'People' };

export default async function UsersPage() {
  const me = await requirePageUser('settings.manage');
  const users = await listUsers();
  return (
    <>
      <h1>People who sign in</h1>
      <section className="card" aria-labelledby="people-h">
        <h2 id="people-h">Everyone</h2>
        <TableScroll label="Everyone who signs in">
          <table>
            <thead>
              <tr>
                <th scope="col">Name</th>
                <th scope="col">Email</th>
                <th scope="col">Role</th>
                <th scope="col">Active</th>
                <th scope="col">New password</th>
                <th scope="col">
                  <span className="sr-only">Save</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {users.map((u) => (
                <UserRow key={u.id} user={u} self={u.id === me.id} />
              ))}
            </tbody>
          </table>
        </TableScroll>
      </section>
      <section className="card" aria-labelledby="add-h">
        <h2 id="add-h">Add a person</h2>
        <AddUserForm />
      </section>
    </>
  );
}
