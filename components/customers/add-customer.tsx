"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { CustomerForm } from "./customer-form";

/** The "Add a customer" button that opens the form in place. */
export function AddCustomer() {
  const [open, setOpen] = useState(false);
  if (!open) return <Button onClick={() => setOpen(true)}>Add a customer</Button>;
  return (
    <Card className="w-full">
      <h2 className="mb-4 text-lead font-bold">Add a customer</h2>
      <CustomerForm onDone={() => setOpen(false)} />
    </Card>
  );
}
