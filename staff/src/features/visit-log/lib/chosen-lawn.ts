/** The lawn the visit is for, as picked from the customer search. */
export interface ChosenLawn {
  customerId: number;
  customerName: string;
  propertyId: number;
  label: string;
  street: string;
  town: string;
}
