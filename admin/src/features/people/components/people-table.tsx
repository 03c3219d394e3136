import { formatStudioDate } from '@ui/format.ts';
import type { StudioPerson } from '@server/contracts/admin-users.ts';
import { roleWords } from '@server/contracts/users.ts';
import { Button } from '@ui/components/button.tsx';
import { ErrorNotice } from '@ui/components/page-state.tsx';
import { useSetRole } from '../api/set-role.ts';

/** Everyone with an account; the owner grants or removes the studio-team role with one button per person. */
export function PeopleTable({ people, myId }: { people: StudioPerson[]; myId: number }) {
  const setRole = useSetRole();
  const pendingId = setRole.isPending ? setRole.variables?.id : undefined;
  return (
    <div className="grid gap-3">
      {setRole.isError && <ErrorNotice message={setRole.error.message} />}
      <div className="overflow-x-auto">
        <table className="w-full min-w-[36rem] text-left text-sm">
          <thead className="text-walnut-500">
            <tr>
              <th scope="col" className="py-1.5 font-medium">
                Person
              </th>
              <th scope="col" className="py-1.5 font-medium">
                Role
              </th>
              <th scope="col" className="py-1.5 font-medium">
                Joined
              </th>
              <th scope="col" className="py-1.5 font-medium">
                <span className="sr-only">Change</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {people.map((person) => (
              <tr key={person.id} className="border-t border-linen-200">
                <th scope="row" className="py-2 pr-3 font-normal">
                  <span className="font-semibold">{person.name}</span>
                  <span className="block text-walnut-500">{person.email}</span>
                </th>
                <td className="py-2">{roleWords[person.role]}</td>
                <td className="py-2">{formatStudioDate(person.joinedAt)}</td>
                <td className="py-2 text-right">
                  {person.id === myId ? (
                    <span className="text-walnut-500">You</span>
                  ) : person.role === 'owner' || person.isListedOwner ? (
                    <span className="text-walnut-500">Owner (set by the server’s OWNER_EMAILS)</span>
                  ) : (
                    <Button
                      tone="quiet"
                      className="min-h-9 px-4 py-1 text-sm"
                      disabled={pendingId === person.id}
                      aria-label={
                        person.role === 'staff'
                          ? `Remove ${person.name} from the studio team`
                          : `Add ${person.name} to the studio team`
                      }
                      onClick={() =>
                        setRole.mutate({ id: person.id, role: person.role === 'staff' ? 'customer' : 'staff' })
                      }
                    >
                      {person.role === 'staff' ? 'Remove from team' : 'Add to team'}
                    </Button>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
