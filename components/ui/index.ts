export { Badge, type BadgeTone } from "./badge";
export { Button, buttonClasses, type ButtonProps } from "./button";
export { Card, CardBody, CardHeader } from "./card";
export { Dialog } from "./dialog";
export { Field, describedBy } from "./field";
export { Input, Textarea, controlClasses } from "./input";
export { Select, type SelectOption } from "./select";
export { Table, TBody, THead, Td, Th } from "./table";
export { ToastProvider, useToast } from "./toast";
